import type { PathDraft, PropertyDraft, SuiteDraft, ToleranceDraft } from './suite-draft';

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** A number field as typed: a number when it reads as one, left as text otherwise so the schema names the rule. */
function num(text: string): number | string | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  return NUMBER.test(t) ? Number(t) : t;
}

function list(text: string): string[] {
  return text
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '');
}

function sampling(p: PathDraft) {
  return p.sampling === 'samples' ? { samples: num(p.samples) } : { at: list(p.at) };
}

function pathBody(p: PathDraft): Record<string, unknown> {
  switch (p.kind) {
    case 'circle':
      return {
        kind: 'circle',
        name: p.name,
        center: p.center,
        radius: p.radius,
        start_angle: p.startAngle,
        turns: p.turns,
        direction: p.direction,
        ...sampling(p),
      };
    case 'segment':
      return { kind: 'segment', name: p.name, from: p.from, to: p.to, ...sampling(p) };
    case 'polyline':
      return { kind: 'polyline', name: p.name, points: p.points, ...sampling(p) };
    case 'points':
      return { kind: 'points', name: p.name, points: p.points };
    case 'straddle':
      return {
        kind: 'straddle',
        name: p.name,
        cut:
          p.cutKind === 'segment'
            ? { kind: 'segment', from: p.cutFrom, to: p.cutTo }
            : { kind: 'ray', from: p.cutFrom, through: p.cutTo },
        along: list(p.along),
        ...(p.offsets.trim() ? { offsets: list(p.offsets) } : {}),
      };
    case 'grid':
      return { ...(p.grid ?? { kind: 'grid' }), name: p.name };
  }
}

function tolerance(t: ToleranceDraft) {
  return t.kind === 'either' ? { ulps: num(t.value), relative: num(t.relative ?? '') } : { [t.kind]: num(t.value) };
}

function propertyBody(p: PropertyDraft): Record<string, unknown> {
  const region =
    p.region === 'disc'
      ? { kind: 'disc', center: p.center, radius: p.radius }
      : p.region === 'box'
        ? { kind: 'box', min: p.min, max: p.max }
        : { kind: 'near-cuts', distance: p.distance };
  return {
    law: p.law,
    region,
    ...(p.law === 'root-power' ? { power: num(p.power) } : {}),
    runs: num(p.runs),
    seed: num(p.seed),
  };
}

/**
 * The suite body the API and the shared schema take, built from what was typed. Field paths
 * of the body are the ones the schema's rules name, and the form shows each rule at that path.
 */
export function draftToSuiteBody(d: SuiteDraft): Record<string, unknown> {
  const nu = d.nuIm.trim() !== '' && d.nuIm.trim() !== '0' ? { re: d.nuRe, im: d.nuIm } : d.nuRe;
  const branch =
    d.branchKind === 'principal'
      ? { kind: 'principal' }
      : {
          kind: 'regular',
          g: d.g,
          nu,
          z0: d.z0,
          ...(d.fixBy === 'f0' ? { f0: d.f0 } : { k: num(d.k) }),
          cuts: d.cuts.map((c) => ({ points: c.points, to_infinity: c.toInfinity })),
        };
  return {
    id: d.id.trim(),
    version: d.version,
    title: d.title,
    story: d.story,
    subject: d.subject,
    branch,
    convention: d.convention,
    paths: d.paths.map(pathBody),
    tolerances: {
      values: tolerance(d.tolerances.values),
      ...(d.tolerances.monodromy ? { monodromy: tolerance(d.tolerances.monodromy) } : {}),
      ...(d.tolerances.properties ? { properties: tolerance(d.tolerances.properties) } : {}),
    },
    properties: d.properties.map(propertyBody),
    // A blank field is left out, so the schema names the rule when both are blank.
    counterparts: d.counterparts.map((c) => ({
      ...(c.subject.trim() === '' ? {} : { subject: c.subject }),
      ...(c.entry.trim() === '' ? {} : { entry: c.entry.trim() }),
    })),
  };
}
