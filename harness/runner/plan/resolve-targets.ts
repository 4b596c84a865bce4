import { compareVersions } from '../../adapters/compare-versions';
import { defaultVariant } from '../../adapters/default-variant';
import { knownTargetsText } from '../../adapters/known-targets-text';
import type { TargetDescriptor } from '../../adapters/target-descriptor';

export type TargetResolution = { ok: true; targets: TargetDescriptor[] } | { ok: false; message: string };

/**
 * The targets `--target` names, among the known ones (installed, and configured ones: their
 * descriptors carry `from`): an exact name ("complex.js@2.4.3", "mathjs@15.2.0/number/predictable",
 * "cmath@3.11.2", "complex.js@2.4.3+local"); a name whose only variant — or, for mathjs, whose
 * default variant (complex entry point, predictable off) — is meant ("mathjs@15.2.0",
 * "mathjs@15.2.0+local"); or a library alone, or with "@latest", for its newest installed version.
 * Anything else is bad input, answered with the names known, installed and configured apart.
 * Each target keeps its way into a worker thread (a configured one's own, else its installed name).
 */
export function resolveTargets(names: string[], known: TargetDescriptor[]): TargetResolution {
  const out: TargetDescriptor[] = [];
  const installed = known.filter((t) => t.from === undefined);
  for (const raw of names) {
    const name = raw.trim();
    let found = known.find((t) => t.name === name);
    if (!found) {
      const variants = known.filter((t) => t.name.startsWith(`${name}/`));
      const [library, version] = name.split('@') as [string, string | undefined];
      const same = installed.filter(
        (t) => t.library === library && (version === undefined || version === 'latest' || t.version === version),
      );
      const newest = same.reduce<string | null>(
        (best, t) => (best === null || compareVersions(t.version, best) > 0 ? t.version : best),
        null,
      );
      found = defaultVariant(variants.length > 0 ? variants : same.filter((t) => t.version === newest));
    }
    if (!found) return { ok: false, message: `unknown target "${name}"; ${knownTargetsText(known)}` };
    const d: TargetDescriptor = found;
    if (!out.some((t) => t.name === d.name))
      out.push({
        name: d.name,
        library: d.library,
        version: d.version,
        settings: d.settings,
        ...(d.from !== undefined ? { from: d.from } : {}),
        open: () => d.open(),
        worker: d.worker ?? { discovered: d.name },
      });
  }
  return { ok: true, targets: out };
}
