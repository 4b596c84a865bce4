import { checkSuite } from './check-suite';
import { suitePicture } from './suite-picture';

/**
 * What the app needs from the harness to author and show suites, in one module so the app can
 * load it on demand: it brings mathjs's parser (~0.5 MB), which no other screen needs.
 */
export const suiteTools = { checkSuite, suitePicture };

export type SuiteTools = typeof suiteTools;
