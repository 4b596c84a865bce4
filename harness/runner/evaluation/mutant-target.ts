import type { CallResult } from '../../adapters/call-result';
import type { ComplexPair } from '../../adapters/complex-pair';
import type { Target } from '../../adapters/target';
import { nextDouble } from '../../paths/next-double';
import { catalogue } from '../../reference/catalogue';

/**
 * The faults the self-check plants (issue item 12): each changes one thing about how a library
 * evaluates the catalogue functions; + − × ÷ and negation are left alone.
 * - `flip-input-zero`: a zero part of the argument reaches the function with the other sign;
 * - `conjugate`: the result is conjugated;
 * - `rotate`: the result is multiplied by e^{2πi/3} (another sheet of a cube root);
 * - `add-4-ulps`: each part of the result is moved 4 doubles up;
 * - `swap-cut-side`: on the function's first cut the value from the other side is returned
 *   (the base is called with the zero part across that cut flipped, which is the other side
 *   for a base that honours zero signs, as cmath does);
 * - `inexact-intermediate`: pow(z, w) is computed as exp(w·log z) through the base's own exp and
 *   log, the product rounded in doubles: the rounded w·log z leaves a tiny part of either sign
 *   where the power is real (pow(−1 + 0i, 13) = −1 − 1.96e−15i, as complex.js 2.4.3 answers), so
 *   a function applied to that power lands on the other side of its cut;
 * - `drop-negative-zero`: every argument is built as a constructor that turns −0 into +0 would
 *   build it (complex.js 2.4.1 does, at every entry), for every operation, arithmetic included.
 */
export type Mutation =
  | 'flip-input-zero'
  | 'conjugate'
  | 'rotate'
  | 'add-4-ulps'
  | 'swap-cut-side'
  | 'inexact-intermediate'
  | 'drop-negative-zero';

const ARITHMETIC = new Set(['add', 'sub', 'mul', 'div', 'neg']);
const ROTATION: ComplexPair = [Math.cos((2 * Math.PI) / 3), Math.sin((2 * Math.PI) / 3)];
const POWER_CUT = { axis: 'real' as const, from: -Infinity, to: 0 };

function firstCut(op: string): { axis: 'real' | 'imaginary'; from: number; to: number } | null {
  const entry = catalogue[op];
  if (!entry) return null;
  if (entry.kind === 'power') return POWER_CUT;
  return entry.fn.cuts[0] ?? null;
}

function onCut(cut: { axis: 'real' | 'imaginary'; from: number; to: number }, [re, im]: ComplexPair): boolean {
  return cut.axis === 'real' ? im === 0 && re > cut.from && re < cut.to : re === 0 && im > cut.from && im < cut.to;
}

const up4 = (x: number): number => nextDouble(nextDouble(nextDouble(nextDouble(x, 1), 1), 1), 1);

/** A target that is `base` with one planted fault; its name says which. */
export function mutantTarget(base: Target, mutation: Mutation): Target {
  const mapValues = (results: CallResult[], f: (v: ComplexPair) => ComplexPair): CallResult[] =>
    results.map((r) => ('value' in r ? { value: f(r.value) } : r));
  return {
    name: `${base.name}+${mutation}`,
    library: base.library,
    version: base.version,
    settings: { ...base.settings, mutation },
    ...(base.entries ? { entries: base.entries } : {}),
    ...(base.convention ? { convention: base.convention } : {}),
    supports: (op) => base.supports(op),
    close: () => base.close(),
    evaluate: async (op, calls, entry) => {
      if (mutation === 'drop-negative-zero')
        // x + 0 is +0 for x = −0 and x itself otherwise: the constructor's own arithmetic that loses the sign.
        return base.evaluate(
          op,
          calls.map((args) => args.map(([re, im]): ComplexPair => [re + 0, im + 0])),
          entry,
        );
      if (ARITHMETIC.has(op)) return base.evaluate(op, calls, entry);
      switch (mutation) {
        case 'flip-input-zero':
          return base.evaluate(
            op,
            calls.map(([z, ...rest]) => {
              const [re, im] = z as ComplexPair;
              const flipped: ComplexPair = im === 0 ? [re, -im] : re === 0 ? [-re, im] : [re, im];
              return [flipped, ...rest];
            }),
            entry,
          );
        case 'conjugate':
          return mapValues(await base.evaluate(op, calls, entry), ([re, im]) => [re, -im]);
        case 'rotate':
          return mapValues(await base.evaluate(op, calls, entry), ([re, im]) => [
            re * ROTATION[0] - im * ROTATION[1],
            re * ROTATION[1] + im * ROTATION[0],
          ]);
        case 'add-4-ulps':
          return mapValues(await base.evaluate(op, calls, entry), ([re, im]) => [up4(re), up4(im)]);
        case 'inexact-intermediate': {
          if (op !== 'pow') return base.evaluate(op, calls, entry);
          const logs = await base.evaluate(
            'log',
            calls.map(([z]) => [z as ComplexPair]),
            entry,
          );
          const products = calls.map(([, w], k): ComplexPair => {
            const l = logs[k];
            if (!l || !('value' in l)) return [NaN, NaN];
            const [a, b] = w as ComplexPair;
            const [c, d] = l.value;
            return [a * c - b * d, a * d + b * c];
          });
          const exps = await base.evaluate(
            'exp',
            products.map((p) => [p]),
            entry,
          );
          return exps.map((e, k) => {
            const l = logs[k];
            return l && 'error' in l ? l : e;
          }) as CallResult[];
        }
        case 'swap-cut-side': {
          const cut = firstCut(op);
          if (!cut) return base.evaluate(op, calls, entry);
          return base.evaluate(
            op,
            calls.map(([z, ...rest]) => {
              const [re, im] = z as ComplexPair;
              if (!onCut(cut, [re, im])) return [[re, im], ...rest];
              return [cut.axis === 'real' ? [re, -im] : [-re, im], ...rest];
            }),
            entry,
          );
        }
      }
    },
  };
}
