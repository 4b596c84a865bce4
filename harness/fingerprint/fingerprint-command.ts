import { fingerprintRequest } from '../../shared/schemas/fingerprint-request';
import { BadInput } from '../command-support/bad-input';
import { findEntry } from '../adapters/find-entry';
import { commandTargets } from '../command-support/command-targets';
import { findTarget } from '../command-support/find-target';
import { readFlags } from '../command-support/read-flags';
import { writeOutput } from '../command-support/write-output';
import { FINGERPRINT_FUNCTIONS } from './fingerprint-functions';
import { fingerprintTable } from './fingerprint-table';
import { fingerprintTarget } from './fingerprint-target';

/**
 * `sheetkeeper fingerprint --target NAME@VERSION[,…] [--fn sqrt,log] [--entry NAME] [--format table|json] [--out FILE]`
 * (and the target-source flags, command-targets.ts):
 * which convention each target follows on each cut of each function (one JSON object per
 * target, in an array when several are named; tables one after the other). Exits 0 when every
 * (function, cut) of every target follows one convention and agrees with the functions sharing
 * its cut, 1 when any is `neither` or `inconsistent`, 2 for bad input.
 */
export async function fingerprintCommand(argv: readonly string[]): Promise<number> {
  const { rest, known } = await commandTargets(argv, { targetFlag: '--target' });
  const request = readFlags(rest, ['target', 'fn', 'entry', 'format', 'out'], fingerprintRequest);
  const functions = request.fn
    ? request.fn.map((label) => {
        const found = FINGERPRINT_FUNCTIONS.find((f) => f.label === label);
        if (!found)
          throw new BadInput(
            `--fn: unknown function "${label}"; known: ${FINGERPRINT_FUNCTIONS.map((f) => f.label).join(', ')}`,
          );
        return found;
      })
    : FINGERPRINT_FUNCTIONS;
  const descriptors = request.target.map((name) => findTarget(name, known));
  const fingerprints = [];
  for (const descriptor of descriptors) {
    const entry = request.entry === undefined ? undefined : findEntry(descriptor, request.entry);
    if (entry instanceof Error) throw new BadInput(`--entry: ${entry.message}`);
    const target = descriptor.open();
    try {
      fingerprints.push(await fingerprintTarget(target, functions, request.entry));
    } finally {
      await target.close();
    }
  }
  const json = fingerprints.length === 1 ? fingerprints[0] : fingerprints;
  writeOutput(
    request.format === 'json' ? JSON.stringify(json, null, 2) : fingerprints.map(fingerprintTable).join('\n\n'),
    request.out,
  );
  return fingerprints.some((fp) => fp.cuts.some((c) => c.behaviour === 'neither' || c.behaviour === 'inconsistent'))
    ? 1
    : 0;
}
