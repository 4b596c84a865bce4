import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { formulaSpeech } from '../../../components/ui/formula-speech';

/**
 * Formulas as the demo suites and the catalogue write them (suites/demo/*.json: subjects, stories
 * and regular branches as SuiteFacts words them; harness/catalogue/entries: the rules a case page
 * shows), each with what a screen reader should say.
 */
const SPOKEN: [string, string][] = [
  ['z^2 - 1', 'z squared minus 1'],
  ['(z^2 - 1)^(1/3)', 'open bracket z squared minus 1 close bracket to the power one third'],
  [
    'regular branch of (z^2 - 1)^{1/2}',
    'regular branch of open bracket z squared minus 1 close bracket to the power one half',
  ],
  ['e^{2πi·2/3}', 'e to the power 2 pi i times two thirds'],
  ['sqrt(z)', 'the square root of z'],
  ['log(z)', 'log of z'],
  ['nthroot(z, 5)', 'the fifth root of z'],
  ['pow(z, 1/3)', 'z to the power one third'],
  ['pow(z, 0.5 + 2i)', 'z to the power 0.5 plus 2 i end exponent'],
  ['pow(z,z)*pow(z,-z)-1', 'z to the power z times z to the power minus z minus 1'],
  ['log(z^13)', 'log of open bracket z to the power 13 close bracket'],
  ['z * cbrt(1 - 1/z^3)', 'z times the cube root of open bracket 1 minus 1 over z cubed close bracket'],
  [
    'sqrt((z - 1) / (z + 1))',
    'the square root of open bracket open bracket z minus 1 close bracket over open bracket z plus 1 close bracket close bracket',
  ],
  ['f(z0) = -1', 'f of z sub 0 equals minus 1'],
  [
    'value k = 0 at z0 = 2 + 0i (the principal value times e^{2πiνk})',
    'value k equals 0 at z sub 0 equals 2 plus 0 i (the principal value times e to the power 2 pi i nu k end exponent)',
  ],
  [
    'a turn around 0 multiplies by e^{2πiν} = −e^{−2π}.',
    'a turn around 0 multiplies by e to the power 2 pi i nu end exponent equals minus e to the power minus 2 pi end exponent.',
  ],
  [
    'DLMF 4.2.26: z^w = exp(w Log z)',
    'DLMF 4.2.26: z to the power w equals the exponential of open bracket w Log z close bracket',
  ],
  [
    'DLMF §4.2(iv) with 4.2.7: √z = exp(½ Log z), Re √z ≥ 0',
    'DLMF §4.2(iv) with 4.2.7: the square root of z equals the exponential of open bracket one half Log z close bracket, Re the square root of z is greater than or equal to 0',
  ],
  [
    'acos z = π/2 + i ln((1 − z²)^½ + iz)',
    'acos z equals pi over 2 plus i ln of open bracket open bracket 1 minus z squared close bracket to the power one half plus iz close bracket',
  ],
  [
    'Log z = ln|z| + i Arg z, −π < Arg ≤ π',
    'Log z equals ln|z| plus i Arg z, minus pi is less than Arg is less than or equal to pi',
  ],
  ['counter-clockwise continuity at 1e-9', 'counter-clockwise continuity at 1 times 10 to the power minus 9'],
];

describe('formulaSpeech', () => {
  it.each(SPOKEN)('says %s as "%s"', (text, spoken) => {
    expect(formulaSpeech(text)).toBe(spoken);
  });

  it('says a rule that quotes typed text with its exponents and signs in words, every other character as typed', () => {
    expect(formulaSpeech('with -1 at z0 the value is multiplied by e^{2πi·2/3}', { variables: false })).toBe(
      'with minus 1 at z sub 0 the value is multiplied by e to the power 2 pi i times two thirds',
    );
  });

  it('leaves words, sentences without maths, run ids and hex floats as they are', () => {
    expect(formulaSpeech('signed zero (IEC 60559 / Annex G): a well-known rule')).toBe(
      'signed zero (IEC 60559 / Annex G): a well-known rule',
    );
    expect(formulaSpeech('a run id, as in "Run 37e7ec6f", or 0x1p-3')).toBe(
      'a run id, as in "Run 37e7ec6f", or 0x1p-3',
    );
  });

  it('says every demo suite’s subject, story and branch without a caret, brace or star', () => {
    const folder = path.join(__dirname, '../../../suites/demo');
    const texts = readdirSync(folder).flatMap((file) => {
      const suite = JSON.parse(readFileSync(path.join(folder, file), 'utf8')) as {
        subject: string;
        story?: string;
        branch: { kind: string; g?: string; nu?: unknown };
      };
      const nu = typeof suite.branch.nu === 'string' ? suite.branch.nu : '1/2';
      return [suite.subject, suite.story ?? '', suite.branch.g ? `regular branch of (${suite.branch.g})^{${nu}}` : ''];
    });
    expect(texts.length).toBeGreaterThan(100);
    for (const text of texts.filter(Boolean)) expect(formulaSpeech(text)).not.toMatch(/[\^{}*]/);
  });
});

// The law's own words for a number, kept apart from formula-speech.ts's tables on purpose.
const NUMBER_WORDS: Record<string, string[]> = {
  '1': ['one'],
  '2': ['two', 'squared', 'half', 'halves', 'square'],
  '3': ['three', 'cubed', 'third', 'thirds', 'cube'],
  '4': ['four', 'quarter', 'quarters', 'fourth'],
  '5': ['five', 'fifth', 'fifths'],
  '6': ['six', 'sixth', 'sixths'],
  '7': ['seven', 'seventh', 'sevenths'],
  '8': ['eight', 'eighth', 'eighths'],
  '9': ['nine', 'ninth', 'ninths'],
  '10': ['tenth', 'tenths'],
};
const VARIABLE_NAMES: Record<string, string> = { ν: 'nu' };

/** A formula the reader accepts, with the variables and numbers written in it. */
interface Written {
  text: string;
  variables: string[];
  numbers: string[];
}
const atom: fc.Arbitrary<Written> = fc.oneof(
  fc.constantFrom('z', 'w', 'k', 'n', 't', 'x', 'y', 'ν').map((v) => ({ text: v, variables: [v], numbers: [] })),
  fc.constantFrom('i', 'e', 'π').map((c) => ({ text: c, variables: [], numbers: [] })),
  fc.integer({ min: 0, max: 999 }).map((n) => ({ text: String(n), variables: [], numbers: [String(n)] })),
  fc
    .tuple(fc.integer({ min: 0, max: 99 }), fc.integer({ min: 0, max: 99 }))
    .map(([a, b]) => ({ text: `${a}.${b}`, variables: [], numbers: [`${a}.${b}`] })),
);
const join = (text: string, ...parts: Written[]): Written => ({
  text,
  variables: parts.flatMap((p) => p.variables),
  numbers: parts.flatMap((p) => p.numbers),
});
const { formula } = fc.letrec<{ formula: Written }>((tie) => ({
  formula: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    atom,
    fc
      .tuple(tie('formula'), fc.constantFrom(' + ', ' - ', ' * ', '*', ' / ', '/', ' · ', ' × ', ' = '), tie('formula'))
      .map(([a, op, b]) => join(`${a.text}${op}${b.text}`, a, b)),
    tie('formula').map((a) => join(`-${a.text}`, a)),
    tie('formula').map((a) => join(`(${a.text})`, a)),
    fc
      .tuple(tie('formula'), fc.constantFrom('^{', '^(', '^'), tie('formula'))
      .map(([a, open, b]) =>
        join(`(${a.text})${open}${b.text}${open === '^{' ? '}' : open === '^(' ? ')' : ''}`, a, b),
      ),
    fc
      .tuple(fc.constantFrom('sqrt', 'log', 'exp', 'asin', 'acoth', 'cbrt', 'f', 'g'), tie('formula'))
      .map(([fn, a]) => ({
        ...join(`${fn}(${a.text})`, a),
        variables: [...(/^[fg]$/.test(fn) ? [fn] : []), ...a.variables],
      })),
    fc
      .tuple(fc.constantFrom('pow', 'nthroot'), tie('formula'), tie('formula'))
      .map(([fn, a, b]) => join(`${fn}(${a.text}, ${b.text})`, a, b)),
    fc
      .tuple(tie('formula'), fc.constantFrom(' where ', ' at ', ', and ', ' {', '} ', ' ^ ', ' ** '), tie('formula'))
      .map(([a, words, b]) => join(`${a.text}${words}${b.text}`, a, b)),
  ),
}));

describe('formulaSpeech, as a law', () => {
  it('says any formula the reader accepts in words: never empty, no caret, brace or star, every variable and number mentioned (seed 1506)', () => {
    fc.assert(
      fc.property(formula, (f) => {
        const spoken = formulaSpeech(f.text);
        const words = new Set(spoken.split(/[^\p{L}\p{N}.]+/u).map((w) => w.replace(/\.$/, '')));
        if (spoken.trim() === '') throw new Error(`nothing said for ${f.text}`);
        if (/[\^{}*]/.test(spoken)) throw new Error(`"${spoken}" keeps a raw sign of ${f.text}`);
        for (const v of f.variables)
          if (!words.has(VARIABLE_NAMES[v] ?? v))
            throw new Error(`"${spoken}" never says the variable ${v} of ${f.text}`);
        for (const n of f.numbers)
          if (!words.has(n) && !(NUMBER_WORDS[n] ?? []).some((w) => words.has(w)))
            throw new Error(`"${spoken}" never says the number ${n} of ${f.text}`);
      }),
      { seed: 1506, numRuns: 3000 },
    );
  });
});
