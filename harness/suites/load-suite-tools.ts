import type { SuiteTools } from './suite-tools';

/**
 * Loads the suite editor's tools (schema check, pictures) on demand: they carry mathjs's
 * parser, so the dynamic import keeps them in a chunk of their own that only suite screens fetch.
 */
export const loadSuiteTools = async (): Promise<SuiteTools> => (await import('./suite-tools')).suiteTools;
