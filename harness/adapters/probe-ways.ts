import { formatDouble } from '../reference/numbers/format-double';
import type { ComplexPair } from './complex-pair';
import type { EntryPointFinding } from './entry-point-finding';
import { libraryValuePair } from './library-value-pair';

/**
 * Builds every input every way and reads the parts back. A way that returns a plain
 * number is read with a +0 imaginary part and noted as such; a way that throws is
 * recorded with its message.
 */
export function probeWays(
  target: string,
  ways: Readonly<Record<string, (z: ComplexPair) => unknown>>,
  inputs: readonly ComplexPair[],
): EntryPointFinding[] {
  const findings: EntryPointFinding[] = [];
  for (const [way, build] of Object.entries(ways)) {
    for (const z of inputs) {
      const input: [string, string] = [formatDouble(z[0]), formatDouble(z[1])];
      try {
        const built = build(z);
        const [re, im] = libraryValuePair(built);
        const note = typeof built === 'number' ? 'a plain number: no imaginary part' : undefined;
        findings.push({
          target,
          way,
          input,
          arrived: [formatDouble(re), formatDouble(im)],
          intact: Object.is(re, z[0]) && Object.is(im, z[1]),
          ...(note ? { note } : {}),
        });
      } catch (e) {
        findings.push({
          target,
          way,
          input,
          arrived: null,
          intact: false,
          error: e instanceof Error ? e.message : String(e),
        });
      }
    }
  }
  return findings;
}
