import type { TargetDescriptor } from '../../adapters/target-descriptor';

export type TargetResolution = { ok: true; targets: TargetDescriptor[] } | { ok: false; message: string };

const numeric = (v: string): number[] => v.split(/[.-]/).map((x) => Number(x) || 0);
const newer = (a: string, b: string): number => {
  const [x, y] = [numeric(a), numeric(b)];
  for (let i = 0; i < Math.max(x.length, y.length); i++)
    if ((x[i] ?? 0) !== (y[i] ?? 0)) return (x[i] ?? 0) - (y[i] ?? 0);
  return 0;
};

/**
 * The targets `--target` names, among the installed ones: an exact name
 * ("complex.js@2.4.3", "mathjs@15.2.0/number/predictable", "cmath@3.11.2"); a library and
 * version whose only variant — or, for mathjs, whose default variant (complex entry point,
 * predictable off) — is meant ("mathjs@15.2.0"); or a library alone, or with "@latest", for
 * its newest installed version. Anything else is bad input, answered with the names known.
 */
export function resolveTargets(names: string[], installed: TargetDescriptor[]): TargetResolution {
  const out: TargetDescriptor[] = [];
  for (const raw of names) {
    const name = raw.trim();
    let found = installed.find((t) => t.name === name);
    if (!found) {
      const [library, version] = name.split('@') as [string, string | undefined];
      const same = installed.filter(
        (t) => t.library === library && (version === undefined || version === 'latest' || t.version === version),
      );
      const newest = same.reduce<string | null>(
        (best, t) => (best === null || newer(t.version, best) > 0 ? t.version : best),
        null,
      );
      const candidates = same.filter((t) => t.version === newest);
      found =
        candidates.length === 1
          ? candidates[0]
          : candidates.find((t) => t.settings.entry === 'complex' && t.settings.predictable === false);
    }
    if (!found)
      return { ok: false, message: `unknown target "${name}"; installed: ${installed.map((t) => t.name).join(', ')}` };
    const d: TargetDescriptor = found;
    if (!out.some((t) => t.name === d.name))
      out.push({
        name: d.name,
        library: d.library,
        version: d.version,
        settings: d.settings,
        open: () => d.open(),
        worker: { discovered: d.name },
      });
  }
  return { ok: true, targets: out };
}
