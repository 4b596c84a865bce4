import { closeSharedBrowser } from './open-browser';

// Runs after each e2e file's own hooks (jest setupFilesAfterEnv): the file's Chromium ends with it.
afterAll(() => closeSharedBrowser());
