import { FUNCTION_CATALOGUE } from './function-catalogue';
import type { FunctionEntry } from './function-entry';

/** Every entry of the function catalogue, in its order. */
export const CATALOGUE_ENTRIES: readonly FunctionEntry[] = Object.values(FUNCTION_CATALOGUE);
