/** A migrated and seeded database that every server test file copies (CREATE DATABASE … TEMPLATE). */
export const TEMPLATE_DATABASE = 'sheetkeeper_test_template';
