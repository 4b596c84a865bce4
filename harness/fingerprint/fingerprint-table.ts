import type { ConventionFingerprint } from '../../shared/convention-fingerprint';

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
    `convention fingerprint of ${fp.target}`,
    fp.statement,
    '',
    line(header),
    line(widths.map((w) => '-'.repeat(w))),
    ...rows.map(line),
    ...(fp.missing.length > 0
      ? ['', `not fingerprinted (the target has no such operation): ${fp.missing.join(', ')}`]
      : []),
  ].join('\n');
}
