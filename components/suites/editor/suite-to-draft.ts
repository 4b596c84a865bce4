import type { Suite } from '../../../shared/schemas/suite-schema';
import type { Tolerance } from '../../../shared/schemas/tolerance-schema';
import { emptyPathDraft } from './empty-path-draft';
import { emptyPropertyDraft } from './empty-property-draft';
import { emptySuiteDraft } from './empty-suite-draft';
import type { PathDraft, PropertyDraft, SuiteDraft, ToleranceDraft } from './suite-draft';

const toleranceDraft = (t: Tolerance): ToleranceDraft =>
  'ulps' in t && 'relative' in t
    ? { kind: 'either', value: String(t.ulps), relative: String(t.relative) }
    : 'ulps' in t
      ? { kind: 'ulps', value: String(t.ulps) }
      : { kind: 'relative', value: String(t.relative) };

/** A stored suite as the form holds it, to edit it (a new draft version where the latest is approved). */
export function suiteToDraft(s: Suite): SuiteDraft {
  const base = emptySuiteDraft();
  const draft: SuiteDraft = {
    ...base,
    id: s.id,
    version: s.version,
    title: s.title,
    story: s.story,
    subject: s.subject,
    convention: s.convention,
    paths: s.paths.map((p): PathDraft => {
      const d: PathDraft = { ...emptyPathDraft(p.name), kind: p.kind };
      switch (p.kind) {
        case 'circle':
          return {
            ...d,
            center: p.center,
            radius: p.radius,
            startAngle: p.start_angle,
            turns: p.turns,
            direction: p.direction,
            ...sampling(p),
          };
        case 'segment':
          return { ...d, from: p.from, to: p.to, ...sampling(p) };
        case 'polyline':
          return { ...d, points: p.points, ...sampling(p) };
        case 'points':
          return { ...d, points: p.points };
        case 'straddle':
          return {
            ...d,
            cutKind: p.cut.kind,
            cutFrom: p.cut.from,
            cutTo: p.cut.kind === 'segment' ? p.cut.to : p.cut.through,
            along: p.along.join(', '),
            offsets: p.offsets.join(', '),
          };
        case 'grid':
          return { ...d, grid: { ...p } };
      }
    }),
    tolerances: {
      values: toleranceDraft(s.tolerances.values),
      monodromy: s.tolerances.monodromy ? toleranceDraft(s.tolerances.monodromy) : null,
      properties: s.tolerances.properties ? toleranceDraft(s.tolerances.properties) : null,
    },
    properties: s.properties.map((p): PropertyDraft => {
      const d: PropertyDraft = {
        ...emptyPropertyDraft(),
        law: p.law,
        region: p.region.kind,
        runs: String(p.runs),
        seed: String(p.seed),
        power: p.power !== undefined ? String(p.power) : '2',
      };
      if (p.region.kind === 'disc') return { ...d, center: p.region.center, radius: p.region.radius };
      if (p.region.kind === 'box') return { ...d, min: p.region.min, max: p.region.max };
      return { ...d, distance: p.region.distance };
    }),
    counterparts: s.counterparts.map((c) => ({ subject: c.subject ?? '', entry: c.entry ?? '' })),
  };
  if (s.branch.kind === 'regular') {
    const b = s.branch;
    return {
      ...draft,
      branchKind: 'regular',
      g: b.g,
      nuRe: typeof b.nu === 'string' ? b.nu : b.nu.re,
      nuIm: typeof b.nu === 'string' ? '' : b.nu.im,
      z0: b.z0,
      fixBy: b.f0 ? 'f0' : 'k',
      f0: b.f0 ?? { re: '', im: '' },
      k: b.k !== undefined ? String(b.k) : '0',
      cuts: b.cuts.map((c) => ({ points: c.points, toInfinity: c.to_infinity })),
    };
  }
  return draft;
}

function sampling(p: { samples?: number; at?: string[] }): Pick<PathDraft, 'sampling' | 'samples' | 'at'> {
  return p.at !== undefined
    ? { sampling: 'at', samples: '65', at: p.at.join(', ') }
    : { sampling: 'samples', samples: String(p.samples ?? ''), at: '' };
}
