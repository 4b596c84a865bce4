import { cutMapRequest } from '../../shared/schemas/cut-map-request';
import { BadInput } from '../command-support/bad-input';
import { commandTargets } from '../command-support/command-targets';
import { findTarget } from '../command-support/find-target';
import { readFlags } from '../command-support/read-flags';
import { writeOutput } from '../command-support/write-output';
import { FINGERPRINT_FUNCTIONS } from '../fingerprint/fingerprint-functions';
import { cutMapSvg } from './cut-map-svg';
import { cutMapTable } from './cut-map-table';
import { mapCuts } from './map-cuts';

/**
 * `sheetkeeper cutmap --target NAME@VERSION --fn sqrt [--box re0,im0,re1,im1] [--grid 81x81]
 * [--format json|svg|table] [--out FILE]` (and the target-source flags, command-targets.ts): where the function is discontinuous over the box,
 * against its expected cuts. Exits 0 when they match, 1 when they differ, 2 for bad input.
 */
export async function cutmapCommand(argv: readonly string[]): Promise<number> {
  const { rest, known } = await commandTargets(argv, { targetFlag: '--target' });
  const request = readFlags(rest, ['target', 'fn', 'box', 'grid', 'format', 'out'], cutMapRequest);
  const fn = FINGERPRINT_FUNCTIONS.find((f) => f.label === request.fn);
  if (!fn)
    throw new BadInput(
      `--fn: unknown function "${request.fn}"; known: ${FINGERPRINT_FUNCTIONS.map((f) => f.label).join(', ')}`,
    );
  const target = findTarget(request.target, known).open();
  try {
    if (!(await target.supports(fn.op))) throw new BadInput(`--fn: ${target.name} has no ${fn.op}`);
    const [re0, im0, re1, im1] = request.box as [number, number, number, number];
    const [columns, rows] = request.grid as [number, number];
    const map = await mapCuts(target, fn, [re0, im0], [re1, im1], columns, rows);
    const text =
      request.format === 'svg'
        ? cutMapSvg(map)
        : request.format === 'table'
          ? cutMapTable(map)
          : JSON.stringify(map, null, 2);
    writeOutput(text, request.out);
    return map.verdict === 'matches' ? 0 : 1;
  } finally {
    await target.close();
  }
}
