import { wireDouble } from '../wire-double';

/** A broken rule of path or region geometry: the field below the path (or region) and the rule. */
export interface GeometryIssue {
  path: (string | number)[];
  message: string;
}

type Point = { re: string; im: string };
type Field = (string | number)[];

/**
 * The rules geometry must meet for a path or a property region to hold any point, read as the
 * harness reads it (every number rounded to its double by `wireDouble`, as
 * harness/paths/geometry-number.ts does), so the schema refuses exactly what the path builders
 * (harness/paths/*-path.ts) and the region samplers (harness/properties/region-arbitrary.ts)
 * would throw on at run time. Each check records its issue and returns the double, or null when
 * the number broke a rule, so the rules that compare numbers run only on readable ones.
 */
export class GeometryRules {
  readonly issues: GeometryIssue[] = [];

  say(path: Field, message: string): void {
    this.issues.push({ path, message });
  }

  finite(path: Field, text: string): number | null {
    const x = wireDouble(text);
    if (Number.isFinite(x)) return x;
    this.say(path, `must be a finite number: the harness cannot place a point at ${text.trim()}`);
    return null;
  }

  point(path: Field, p: Point): { re: number; im: number } | null {
    const re = this.finite([...path, 're'], p.re);
    const im = this.finite([...path, 'im'], p.im);
    return re === null || im === null ? null : { re, im };
  }

  /** A length that must be above 0 once read as a double ("1e-400" reads as 0). */
  positive(path: Field, text: string, what: string): number | null {
    const x = this.finite(path, text);
    if (x === null) return null;
    if (x > 0) return x;
    this.say(
      path,
      x === 0 && writesNonZero(text)
        ? `must be greater than 0: ${text.trim()} is below the least double and reads as 0, so ${what}`
        : `must be greater than 0: with ${text.trim()} ${what}`,
    );
    return null;
  }

  /** Two corners of a rectangle (a grid, a box): finite, `max` right of and above `min`. */
  corners(min: Point, max: Point, shape: string): void {
    const lo = this.point(['min'], min);
    const hi = this.point(['max'], max);
    if (!lo || !hi) return;
    if (!(lo.re < hi.re)) this.say(['max', 're'], `must be greater than min’s: the ${shape} has no width`);
    if (!(lo.im < hi.im)) this.say(['max', 'im'], `must be greater than min’s: the ${shape} has no height`);
  }

  /** A value of t or a fraction along a segment: between 0 and 1. */
  fraction(path: Field, text: string, what: string): number | null {
    const x = this.finite(path, text);
    if (x === null) return null;
    if (x >= 0 && x <= 1) return x;
    this.say(path, `must be between 0 and 1: ${what}`);
    return null;
  }
}

/** Whether the digits written name a value other than 0 (one that can still round to 0). */
function writesNonZero(text: string): boolean {
  const t = text.trim().replace(/^[+-]/, '');
  const digits = /^0x/i.test(t) ? t.slice(2).replace(/p.*$/i, '') : t.replace(/[e/].*$/i, '');
  return /[1-9a-f]/i.test(digits);
}
