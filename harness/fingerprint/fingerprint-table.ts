import type { ConventionFingerprint } from '../../shared/convention-fingerprint';
import { formatComplexText } from '../../shared/format-complex-text';

/**
 * A fingerprint as a plain-text table: one row per (function, cut) with the behaviour, the
 * function's own verdict, the functions it disagrees with and the first note of a place that
 * voted `neither`; the statement of what was checked comes first, the missing functions last.
 */
export function fingerprintTable(fp: ConventionFingerprint): string {
  const rows = fp.cuts.map((c) => [
    c.function,
    c.cut,
    c.behaviour,
    c.alone === c.behaviour ? '' : `alone: ${c.alone}`,
    c.disagreesWith.length > 0 ? `disagrees with ${c.disagreesWith.join(', ')}` : '',
    c.probes.find((p) => p.note)?.note ?? '',
  ]);
  const header = ['function', 'cut', 'behaviour', 'own', 'shared cut', 'note'];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) =>
    cells
      .map((c, i) => c.padEnd(widths[i]!))
      .join('  ')
      .trimEnd();
  return [
    `convention fingerprint of ${fp.target}${fp.entry ? `, values built through its ${fp.entry} entry` : ''}`,
    fp.statement,
    '',
    line(header),
    line(widths.map((w) => '-'.repeat(w))),
    ...rows.map(line),
    // Where each pair sharing a cut parts ways, so the "disagrees with" column can be checked at one point.
    ...fp.cuts.flatMap((c) =>
      (c.disagreements ?? []).map(
        (d) =>
          `${c.function} and ${d.with} on ${c.cut}: ` +
          d.sides
            .map(
              (s) =>
                `at ${formatComplexText(s.at, { ascii: true })} ${s.function} gives ${formatComplexText(s.value, { ascii: true })} (${s.follows ?? 'neither convention'})`,
            )
            .join(', '),
      ),
    ),
    ...(fp.missing.length > 0
      ? ['', `not fingerprinted (the target has no such operation): ${fp.missing.join(', ')}`]
      : []),
  ].join('\n');
}
