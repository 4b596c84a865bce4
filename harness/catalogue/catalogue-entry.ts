import { CATALOGUE_ENTRIES } from './catalogue-entries';
import type { FunctionEntry } from './function-entry';

const BY_NAME: ReadonlyMap<string, FunctionEntry> = new Map(CATALOGUE_ENTRIES.map((entry) => [entry.name, entry]));

/** The catalogue entry named `name`, or undefined for a name outside the catalogue (a Map, so "toString" is not one). */
export function catalogueEntry(name: string): FunctionEntry | undefined {
  return BY_NAME.get(name);
}
