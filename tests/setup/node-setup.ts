import 'reflect-metadata';

// Node tests use the test database unless the caller chose one.
process.env.SHEETKEEPER_DB ??= 'sheetkeeper_test';
