import { readFormula, type FormulaTerm } from './read-formula';

/** A term, or an exponent with its own terms, in the order read. */
type Item = { term: FormulaTerm } | { exponent: Item[] };
/** A phrase of the spoken form: `spaced` phrases are words we say and stand apart; others are the text as written. */
interface Phrase {
  text: string;
  spaced: boolean;
  gap: boolean;
}

const FUNCTION_WORDS: Record<string, string> = {
  sqrt: 'the square root of',
  cbrt: 'the cube root of',
  exp: 'the exponential of',
  log: 'log of',
  Log: 'Log of',
  ln: 'ln of',
  asin: 'arcsine of',
  acos: 'arccosine of',
  atan: 'arctangent of',
  acot: 'arccotangent of',
  asec: 'arcsecant of',
  acsc: 'arccosecant of',
  asinh: 'inverse hyperbolic sine of',
  acosh: 'inverse hyperbolic cosine of',
  atanh: 'inverse hyperbolic tangent of',
  acoth: 'inverse hyperbolic cotangent of',
  asech: 'inverse hyperbolic secant of',
  acsch: 'inverse hyperbolic cosecant of',
  sin: 'sine of',
  cos: 'cosine of',
  tan: 'tangent of',
  sinh: 'hyperbolic sine of',
  cosh: 'hyperbolic cosine of',
  tanh: 'hyperbolic tangent of',
  conj: 'the conjugate of',
  Re: 'the real part of',
  Im: 'the imaginary part of',
  Arg: 'Arg of',
  arg: 'arg of',
};
// Signs this file reads in texts and never shows are written as escapes (∛ U+221B, ∓ U+2213, ÷ U+00F7,
// ≥ U+2265): tests/constants/glyphs.test.ts and font-coverage.test.ts hold what the app shows.
const ROOT_WORDS: Record<string, string> = { '√': 'the square root of', '\u221B': 'the cube root of' };
const SIGN_WORDS: Record<string, string> = {
  '+': 'plus',
  '=': 'equals',
  '±': 'plus or minus',
  '\u2213': 'minus or plus',
  '\u00F7': 'divided by',
  '∞': 'infinity',
  '≈': 'approximately equals',
  '≠': 'is not equal to',
  '≤': 'is less than or equal to',
  '\u2265': 'is greater than or equal to',
  '<': 'is less than',
  '>': 'is greater than',
  '→': 'to',
  '²': 'squared',
  '³': 'cubed',
  '½': 'one half',
  '⅓': 'one third',
  '⅔': 'two thirds',
  '¼': 'one quarter',
  '¾': 'three quarters',
  '′': 'prime',
  '^': 'caret',
  '{': 'open brace',
  '}': 'close brace',
};
const LETTER_NAMES: Record<string, string> = {
  π: 'pi',
  ν: 'nu',
  α: 'alpha',
  β: 'beta',
  γ: 'gamma',
  δ: 'delta',
  ε: 'epsilon',
  θ: 'theta',
  λ: 'lambda',
  μ: 'mu',
  σ: 'sigma',
  φ: 'phi',
  ω: 'omega',
};
const CARDINALS = ['zero', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine'];
const ORDINALS: Record<number, [string, string]> = {
  2: ['half', 'halves'],
  3: ['third', 'thirds'],
  4: ['quarter', 'quarters'],
  5: ['fifth', 'fifths'],
  6: ['sixth', 'sixths'],
  7: ['seventh', 'sevenths'],
  8: ['eighth', 'eighths'],
  9: ['ninth', 'ninths'],
  10: ['tenth', 'tenths'],
};
const ROOT_DEGREES: Record<string, string> = { '2': 'square', '3': 'cube', '4': 'fourth', '5': 'fifth', '6': 'sixth' };
/** Written phrases a spoken word does not stand apart from: "(" before it, ")" or punctuation after it. */
const OPENING = /^[([“‘"|]$/;
const CLOSING = /^[)\],.;:!?’”"…|]$/;
const INTEGER = /^[0-9]+$/;
const FRACTION_GLYPHS = /^[½⅓⅔¼¾]$/;

const termAt = (items: readonly Item[], i: number): FormulaTerm | null => {
  const it = items[i];
  return it && 'term' in it ? it.term : null;
};
/** A number, letter, bracket or exponent: a "/" between two of them is a fraction bar ("over"), else a slash (ISO/IEC). */
const isMathsItem = (it: Item | undefined) =>
  !!it && ('exponent' in it || ['number', 'variable', 'constant', 'index', 'open', 'close'].includes(it.term.kind));
const isSpace = (it: Item) => 'term' in it && it.term.kind === 'space';
/** The nearest item before (−1) or after (1) index `i` that is not a space. */
const solidAt = (items: readonly Item[], i: number, step: 1 | -1): Item | undefined => {
  let j = i + step;
  while (items[j] && isSpace(items[j]!)) j += step;
  return items[j];
};
const solid = (items: readonly Item[]) => items.filter((it) => !isSpace(it));

/** One number, variable (with its index), constant, word or simple fraction, perhaps after a minus: said without brackets or "end exponent". */
function isSingle(items: readonly Item[]): boolean {
  const s = solid(items);
  const kinds = s.map((it) => ('term' in it ? it.term.kind : 'exponent'));
  const rest = kinds[0] === 'minus' ? kinds.slice(1) : kinds;
  const texts = s.map((it) => ('term' in it ? it.term.text : ''));
  if (rest.length === 1)
    return ['number', 'variable', 'constant', 'word'].includes(rest[0]!) || FRACTION_GLYPHS.test(texts.at(-1)!);
  if (rest.length === 2) return rest[0] === 'variable' && rest[1] === 'index';
  const t = kinds[0] === 'minus' ? texts.slice(1) : texts;
  return rest.length === 3 && INTEGER.test(t[0]!) && t[1] === '/' && INTEGER.test(t[2]!);
}

/** "two thirds" for 2/3 (numerators to 9, denominators to 10), "13 over 27" otherwise. */
function fractionWords(p: string, q: string): string {
  const n = Number(p);
  const d = ORDINALS[Number(q)];
  if (d && n >= 1 && n <= 9 && p === String(n)) return `${CARDINALS[n]} ${n === 1 ? d[0] : d[1]}`;
  return `${p} over ${q}`;
}

/** A number as written; exponent notation in words: 1e−300 is "1 times 10 to the power minus 300". */
function numberPhrase(text: string): Phrase {
  const m = /^([0-9.]+)e([-−+]?)([0-9]+)$/.exec(text);
  if (!m) return { text, spaced: false, gap: false };
  const sign = m[2] === '-' || m[2] === '−' ? 'minus ' : '';
  return { text: `${m[1]!} times 10 to the power ${sign}${m[3]!}`, spaced: true, gap: false };
}

/** Index of the ")" that closes the "(" at `open`, or −1. */
function closing(items: readonly Item[], open: number): number {
  let depth = 0;
  for (let j = open; j < items.length; j++) {
    const t = termAt(items, j);
    if (t?.kind === 'open') depth++;
    else if (t?.kind === 'close' && --depth === 0) return j;
  }
  return -1;
}

/** The slices of `items` between top-level commas. */
function splitArguments(items: readonly Item[]): Item[][] {
  const out: Item[][] = [[]];
  let depth = 0;
  for (const it of items) {
    const t = 'term' in it ? it.term : null;
    if (t?.kind === 'open') depth++;
    if (t?.kind === 'close') depth--;
    if (t && depth === 0 && t.text === ',') out.push([]);
    else out[out.length - 1]!.push(it);
  }
  return out;
}

function join(phrases: readonly Phrase[]): string {
  let out = '';
  phrases.forEach((p, i) => {
    const before = phrases[i - 1];
    const apart =
      before && (p.gap || ((before.spaced || p.spaced) && !OPENING.test(before.text) && !CLOSING.test(p.text)));
    out += (apart ? ' ' : '') + p.text;
  });
  return out.replace(/\s+/g, ' ').trim();
}

/** The phrases of a run of items; `maths` says brackets (inside a formula's bracket or call) and `atEnd` whether nothing follows. */
function speak(items: readonly Item[], maths: boolean, atEnd: boolean): Phrase[] {
  const out: Phrase[] = [];
  let gap = false;
  const say = (text: string, spaced = true) => {
    out.push({ text, spaced, gap });
    gap = false;
  };
  const sayAll = (phrases: Phrase[]) => {
    if (phrases.length === 0) return;
    phrases[0] = { ...phrases[0]!, gap: phrases[0]!.gap || gap };
    out.push(...phrases);
    gap = false;
  };
  /** An argument alone when it is one item, else between spoken brackets. */
  const sayArgument = (arg: readonly Item[]) => {
    if (isSingle(arg)) sayAll(speak(arg, true, false));
    else {
      say('open bracket');
      sayAll(speak(arg, true, false));
      say('close bracket');
    }
  };
  const sayExponent = (exponent: readonly Item[], last: boolean) => {
    const s = solid(exponent);
    const only = s.length === 1 ? termAt(s, 0) : null;
    if (only?.kind === 'number' && (only.text === '2' || only.text === '3')) {
      say(only.text === '2' ? 'squared' : 'cubed');
      return;
    }
    say('to the power');
    sayAll(speak(exponent, true, false));
    if (!isSingle(exponent) && !last) say('end exponent');
  };
  const lastSolid = items.findLastIndex((it) => !isSpace(it));

  for (let i = 0; i < items.length; i++) {
    const it = items[i]!;
    if ('exponent' in it) {
      sayExponent(it.exponent, atEnd && i === lastSolid);
      continue;
    }
    const t = it.term;
    const next = termAt(items, i + 1);
    const callEnd = next?.kind === 'open' ? closing(items, i + 1) : -1;
    switch (t.kind) {
      case 'space':
        gap = true;
        break;
      case 'variable':
        say(LETTER_NAMES[t.text] ?? t.text);
        // f(z0) and g(z) are functions of what follows.
        if ((t.text === 'f' || t.text === 'g') && callEnd > 0) {
          say('of');
          sayArgument(items.slice(i + 2, callEnd));
          i = callEnd;
        }
        break;
      case 'constant':
        say(LETTER_NAMES[t.text] ?? t.text);
        break;
      case 'index':
        say('sub');
        say(t.text);
        break;
      case 'number': {
        const slash = termAt(items, i + 1);
        const q = termAt(items, i + 2);
        const fraction =
          INTEGER.test(t.text) &&
          slash?.text === '/' &&
          q?.kind === 'number' &&
          INTEGER.test(q.text) &&
          termAt(items, i - 1)?.text !== '/' &&
          termAt(items, i + 3)?.text !== '/';
        if (fraction) {
          say(fractionWords(t.text, q.text));
          i += 2;
        } else sayAll([numberPhrase(t.text)]);
        break;
      }
      case 'minus':
        say('minus');
        break;
      case 'times':
        say('times');
        break;
      case 'hyphen':
        say(t.text, false);
        break;
      case 'word': {
        const args = callEnd > 0 ? splitArguments(items.slice(i + 2, callEnd)) : [];
        if (t.text === 'pow' && args.length === 2) {
          sayArgument(args[0]!);
          sayExponent(args[1]!, false);
        } else if (t.text === 'nthroot' && args.length === 2) {
          const degree = solid(args[1]!);
          const only = degree.length === 1 ? termAt(degree, 0) : null;
          const named = only ? ROOT_DEGREES[only.text] : undefined;
          if (named) say(`the ${named} root of`);
          else {
            say('the root of index');
            sayAll(speak(args[1]!, true, false));
            say('of');
          }
          sayArgument(args[0]!);
        } else if (FUNCTION_WORDS[t.text] && callEnd > 0) {
          say(FUNCTION_WORDS[t.text]!);
          if (args.length === 1) sayArgument(args[0]!);
          else {
            say('open bracket');
            sayAll(speak(items.slice(i + 2, callEnd), true, false));
            say('close bracket');
          }
        } else {
          say(t.text, false);
          break;
        }
        i = callEnd;
        break;
      }
      case 'open': {
        const end = closing(items, i);
        // A bracket is said where it groups maths: before an exponent, or inside a formula's bracket or call.
        const grouping = end > 0 && (maths || (items[end + 1] !== undefined && 'exponent' in items[end + 1]!));
        if (!grouping) {
          say(t.text, false);
          break;
        }
        say('open bracket');
        sayAll(speak(items.slice(i + 1, end), true, false));
        say('close bracket');
        i = end;
        break;
      }
      case 'close':
        say(t.text, false);
        break;
      case 'sign': {
        if (ROOT_WORDS[t.text]) {
          say(ROOT_WORDS[t.text]!);
          if (callEnd > 0) {
            sayArgument(items.slice(i + 2, callEnd));
            i = callEnd;
          }
        } else if (t.text === '/' && isMathsItem(solidAt(items, i, -1)) && isMathsItem(solidAt(items, i, 1)))
          say('over');
        else if (SIGN_WORDS[t.text]) say(SIGN_WORDS[t.text]!);
        else say(t.text, false);
        break;
      }
    }
  }
  return out;
}

/**
 * A formula (or a sentence with formulas in it) as a screen reader should say it, read by the
 * very reading that sets it (read-formula.ts), so what is heard is what is seen: "z squared
 * minus 1" for z² − 1, "open bracket z squared minus 1 close bracket to the power one third" for
 * (z² − 1)^⅓, "e to the power 2 pi i times two thirds" for e^{2πi·2/3}, "the square root of z",
 * "log of z", "f of z sub 0". It follows the W3C's MathSpeak and ClearSpeak practice (as in
 * MathML speech rules): an exponent of 2 or 3 is "squared" or "cubed", any other is "to the
 * power …", closed by "end exponent" when it is more than a single item (a number, a letter, a
 * simple fraction, perhaps negative) and something follows; an index is "sub"; a simple
 * fraction is said in words ("one third", "two fifths"), another "p over q"; a bracket is said
 * where it groups maths (before an exponent, around a function's argument of more than one
 * item, inside another said bracket); "−" is "minus" and "·", "*" and "×" are "times" (the
 * glyphs × and − of constants/glyphs.ts never reach a formula). Words and punctuation of the
 * sentence around stay as written.
 */
export function formulaSpeech(text: string, { variables = true }: { variables?: boolean } = {}): string {
  const items: Item[] = [];
  for (const run of readFormula(text, { variables })) {
    const terms: Item[] = run.terms.map((term) => ({ term }));
    if (run.raised) items.push({ exponent: terms });
    else items.push(...terms);
  }
  return join(speak(items, false, true));
}
