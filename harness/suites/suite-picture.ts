import { subjectCuts } from '../cuts/subject-cuts';
import { parseSubject } from '../expressions/parse-subject';
import { buildPath } from '../paths/build-path';
import { FactoredFunction } from '../reference/continuation/factored-function';
import { parseDouble } from '../reference/numbers/parse-double';
import { parseNumber } from '../reference/numbers/parse-number';
import { Rational } from '../reference/numbers/rational';
import { toPathSpec } from '../runner/evaluation/to-path-spec';
import { branchSpecSchema } from '../../shared/schemas/branch-spec-schema';
import { suitePathSchema } from '../../shared/schemas/suite-path-schema';

interface Point {
  re: number;
  im: number;
}

/** What a suite looks like on the plane: its sampled paths, its cuts and its branch points. */
export interface SuitePictureData {
  /** Circles, segments and polylines as lines (`line`); straddles and lists of points as separate points (`points`). */
  paths: { name: string; draw: 'line' | 'points'; points: Point[] }[];
  cuts: { points: Point[]; toInfinity: boolean }[];
  branchPoints: Point[];
  /** What the picture leaves out and why, in words, so an empty spot is never mistaken for "nothing there". */
  notes: string[];
}

/** A picture needs the shape, not every sample: more than this many points per line add nothing visible. */
const MAX_DRAWN_SAMPLES = 721;

/**
 * The plane picture of a suite, possibly unfinished (the form draws it as the author types):
 * every part that passes its own schema is drawn with the same code the runner uses (path
 * generators; branch points as zeros and poles of g where ν·m ∉ ℤ; a principal subject's
 * catalogue cuts); anything that cannot be drawn is named in `notes`.
 */
export function suitePicture(data: unknown): SuitePictureData {
  const record = data && typeof data === 'object' ? (data as Record<string, unknown>) : {};
  const out: SuitePictureData = { paths: [], cuts: [], branchPoints: [], notes: [] };
  const rawPaths = Array.isArray(record.paths) ? record.paths : [];
  rawPaths.forEach((raw, i) => {
    const parsed = suitePathSchema.safeParse(raw);
    const label = `Path ${i + 1}`;
    if (!parsed.success) {
      out.notes.push(`${label} is not drawn until its fields are valid.`);
      return;
    }
    const path = parsed.data;
    if (path.kind === 'grid') {
      out.notes.push(`${label} (${path.name}) is a grid; grids are not drawn.`);
      return;
    }
    const drawn =
      path.kind !== 'straddle' &&
      path.kind !== 'points' &&
      path.samples !== undefined &&
      path.samples > MAX_DRAWN_SAMPLES
        ? { ...path, samples: MAX_DRAWN_SAMPLES }
        : path;
    try {
      const points = buildPath(toPathSpec(drawn)).map((p) => ({ re: p.z.re, im: p.z.im }));
      out.paths.push({
        name: path.name,
        draw: path.kind === 'straddle' || path.kind === 'points' ? 'points' : 'line',
        points,
      });
    } catch (e) {
      out.notes.push(`${label} (${path.name}) cannot be drawn: ${e instanceof Error ? e.message : String(e)}.`);
    }
  });

  const branch = branchSpecSchema.safeParse(record.branch);
  if (!branch.success) {
    out.notes.push('Cuts and branch points are drawn once the branch spec is valid.');
    return out;
  }
  if (branch.data.kind === 'regular') {
    const spec = branch.data;
    for (const cut of spec.cuts) {
      const points = cut.points.map((p) => safePoint(p.re, p.im)).filter((p): p is Point => p !== null);
      if (points.length >= 2) out.cuts.push({ points, toInfinity: cut.to_infinity });
    }
    try {
      const nu =
        typeof spec.nu === 'string'
          ? { re: exact(spec.nu), im: Rational.ZERO }
          : { re: exact(spec.nu.re), im: exact(spec.nu.im) };
      const g = FactoredFunction.fromSubject(parseSubject(spec.g));
      for (const s of g.singularities()) {
        const m = new Rational(BigInt(s.order));
        if (!nu.im.isZero() || !nu.re.mul(m).isInteger()) out.branchPoints.push({ re: s.at[0], im: s.at[1] });
      }
    } catch (e) {
      out.notes.push(`Branch points are not drawn: ${e instanceof Error ? e.message : String(e)}.`);
    }
    return out;
  }
  if (typeof record.subject !== 'string' || record.subject.trim() === '') return out;
  try {
    const cuts = subjectCuts(parseSubject(record.subject), branch.data);
    if (cuts === null) {
      out.notes.push(
        `The cuts of ${record.subject} are not drawn: for a principal subject other than one catalogue function of z they are preimages of the catalogue cuts, which Sheetkeeper does not compute.`,
      );
      return out;
    }
    for (const cut of cuts) {
      out.cuts.push({ points: [toPoint(cut.from), toPoint(cut.to)], toInfinity: cut.toInfinity });
      if (!out.branchPoints.some((p) => p.re === cut.from[0] && p.im === cut.from[1]))
        out.branchPoints.push(toPoint(cut.from));
    }
  } catch (e) {
    out.notes.push(`Cuts are not drawn: ${e instanceof Error ? e.message : String(e)}.`);
  }
  return out;
}

function toPoint([re, im]: [number, number] | readonly [number, number]): Point {
  return { re, im };
}

function safePoint(re: string, im: string): Point | null {
  try {
    const p = { re: parseDouble(re), im: parseDouble(im) };
    return Number.isFinite(p.re) && Number.isFinite(p.im) ? p : null;
  } catch {
    return null;
  }
}

function exact(text: string): Rational {
  const parsed = parseNumber(text);
  if (parsed.kind !== 'exact') throw new RangeError(`ν must be finite, not "${text}"`);
  return parsed.value;
}
