import { fingerprintRequest } from '../../shared/schemas/fingerprint-request';
import { BadInput } from '../command-support/bad-input';
import { findTarget } from '../command-support/find-target';
import { readFlags } from '../command-support/read-flags';
import { writeOutput } from '../command-support/write-output';
import { FINGERPRINT_FUNCTIONS } from './fingerprint-functions';
import { fingerprintTable } from './fingerprint-table';
import { fingerprintTarget } from './fingerprint-target';

/**
 * `sheetkeeper fingerprint --target NAME@VERSION [--fn sqrt,log] [--format table|json] [--out FILE]`:
 * which convention the target follows on each cut of each function. Exits 0 when every
 * (function, cut) follows one convention and agrees with the functions sharing its cut, 1
 * when any is `neither` or `inconsistent`, 2 for bad input.
 */
export async function fingerprintCommand(argv: readonly string[]): Promise<number> {
  const request = readFlags(argv, ['target', 'fn', 'format', 'out'], fingerprintRequest);
  const functions = request.fn
    ? request.fn.map((label) => {
        const found = FINGERPRINT_FUNCTIONS.find((f) => f.label === label);
        if (!found) throw new BadInput(`--fn: unknown function "${label}"; known: ${FINGERPRINT_FUNCTIONS.map((f) => f.label).join(', ')}`);
        return found;
      })
    : FINGERPRINT_FUNCTIONS;
  const target = findTarget(request.target).open();
  try {
    const fp = await fingerprintTarget(target, functions);
    writeOutput(request.format === 'json' ? JSON.stringify(fp, null, 2) : fingerprintTable(fp), request.out);
    return fp.cuts.some((c) => c.behaviour === 'neither' || c.behaviour === 'inconsistent') ? 1 : 0;
  } finally {
    await target.close();
  }
}
