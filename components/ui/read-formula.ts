/**
 * One term of a formula as read: what it is (`kind`), the text as written (`text`) and as set
 * (`shown`: U+2212 for a minus, "·" for `*`, when variables are set). An `index` is the digit run
 * after a one-letter variable (z0 is z₀).
 */
export interface FormulaTerm {
  kind:
    | 'variable'
    | 'constant'
    | 'index'
    | 'word'
    | 'number'
    | 'minus'
    | 'hyphen'
    | 'times'
    | 'open'
    | 'close'
    | 'space'
    | 'sign';
  text: string;
  shown: string;
  italic: boolean;
}

/** A formula as read: runs on the line and raised runs (exponents), in order. */
export interface FormulaRun {
  raised: boolean;
  terms: FormulaTerm[];
}

/**
 * One-letter names set in italics as variables (z, w, g, the exponent ν, a sheet k, the counts Z
 * and P of zeros and poles…); i, e and π are constants and stay upright (ISO 80000-2).
 */
const VARIABLES = new Set(['z', 'w', 'g', 'f', 'k', 'm', 'n', 't', 'x', 'y', 'ν', 'Z', 'P']);
const CONSTANTS = new Set(['i', 'e', 'π']);
const LETTER = /[A-Za-zα-ωΑ-Ω]/;
const GREEK = /[α-ωΑ-Ω]/;
const DIGIT = /[0-9]/;
const SPACE = /\s/;
/** A number as written: digits, decimals or a section number (4.2.26), an exponent (1e-9, 1e−300). */
const NUMBER = /^[0-9]+(?:\.[0-9]+)*(?:e[-−+]?[0-9]+)?/;
const MINUS = '\u2212';

/**
 * Reads a formula as written in the product's texts and suites — `(z^2 - 1)^(1/3)`,
 * `e^{2πi·2/3}`, `principal·e^(2πiνk)`, `f(z0)` — into terms, the one reading that both the
 * pieces set on screen (formula-pieces.ts) and the spoken form (formula-speech.ts) derive from:
 * `^{…}`, `^(…)` and `^` before a number, a name or a fraction glyph (½) raise what follows (the braces or parentheses
 * go, the raise delimits it); a digit run right after a one-letter variable on the line is its
 * index (z0 → z₀); one-letter variables are italic; a hyphen that is a minus (alone between
 * spaces, or before a number or name at the start, after "(", ")", ",", "=" or a space) is set as
 * U+2212, and `*` as "·". Words, hyphenated words ("counter-clockwise") and numbers such as 1e-9
 * stay as they are. With `variables: false` every term is shown as typed, only the raising is
 * done: text that quotes what someone typed ("with -1 the circle has no points") keeps every
 * character, though its terms are still read for their kind (so "-1" is said "minus 1").
 */
export function readFormula(text: string, { variables = true }: { variables?: boolean } = {}): FormulaRun[] {
  const runs: FormulaRun[] = [];
  const readRun = (run: string, raised: boolean) => {
    if (run === '') return;
    const terms: FormulaTerm[] = [];
    const add = (kind: FormulaTerm['kind'], t: string, shown = t, italic = false) =>
      terms.push({ kind, text: t, shown: variables ? shown : t, italic: variables && italic });
    let i = 0;
    while (i < run.length) {
      const c = run[i]!;
      if (LETTER.test(c)) {
        let j = i;
        while (j < run.length && LETTER.test(run[j]!)) j++;
        const word = run.slice(i, j);
        // A run with a Greek letter is a product (2πiνk), set letter by letter; other runs are names (exp, sqrt) or words.
        if (word.length > 1 && GREEK.test(word) && [...word].every((l) => VARIABLES.has(l) || CONSTANTS.has(l))) {
          for (const l of word) add(VARIABLES.has(l) ? 'variable' : 'constant', l, l, VARIABLES.has(l));
        } else if (word.length === 1 && VARIABLES.has(word)) {
          add('variable', word, word, true);
          let k = j;
          while (k < run.length && DIGIT.test(run[k]!)) k++;
          // An index only on the line: z0 is z₀, but a raised 2k stays as it is.
          if (k > j && !raised && (k === run.length || !LETTER.test(run[k]!))) {
            add('index', run.slice(j, k));
            j = k;
          }
        } else add(word.length === 1 && CONSTANTS.has(word) ? 'constant' : 'word', word);
        i = j;
        continue;
      }
      // A digit-led run with two Latin letters or more is a name as written (a run id 37e7ec6f, a hex float 0x1p-3), not 37·10⁷…
      const name = DIGIT.test(c) ? /^[0-9][0-9A-Za-z]*/.exec(run.slice(i))![0] : '';
      if ((name.match(/[A-Za-z]/g) ?? []).length >= 2) {
        add('word', name);
        i += name.length;
        continue;
      }
      const number = DIGIT.test(c) ? NUMBER.exec(run.slice(i)) : null;
      if (number) {
        add('number', number[0]);
        i += number[0].length;
        continue;
      }
      if (c === '-') {
        const before = i === 0 ? '' : run[i - 1]!;
        const after = run[i + 1] ?? '';
        // After a closing bracket too: pow(z,-z)-1 subtracts 1.
        const minus =
          (before === ' ' && after === ' ') ||
          ((before === '' || /[\s(,=[{^)]/.test(before)) && /[0-9A-Za-zα-ω(π∞.]/.test(after));
        if (minus) add('minus', c, MINUS);
        else add('hyphen', c);
      } else if (c === MINUS) add('minus', c);
      else if (c === '*') add('times', c, '·');
      else if (c === '·' || c === '×') add('times', c);
      else if (c === '(') add('open', c);
      else if (c === ')') add('close', c);
      else if (SPACE.test(c)) add('space', c);
      else add('sign', c);
      i++;
    }
    runs.push({ raised, terms });
  };

  let i = 0;
  let plain = '';
  while (i < text.length) {
    if (text[i] !== '^') {
      plain += text[i];
      i++;
      continue;
    }
    const open = text[i + 1];
    let raised: string | null = null;
    let next = i + 1;
    if (open === '{' || open === '(') {
      const close = open === '{' ? '}' : ')';
      let depth = 0;
      for (let j = i + 1; j < text.length; j++) {
        if (text[j] === open) depth++;
        else if (text[j] === close && --depth === 0) {
          raised = text.slice(i + 2, j);
          next = j + 1;
          break;
        }
      }
    } else {
      const m = /^[-−]?(?:[0-9]+(?:\.[0-9]+)?|[A-Za-zα-ωπ][0-9]*|[½⅓⅔¼¾])/.exec(text.slice(i + 1));
      if (m) {
        raised = m[0];
        next = i + 1 + m[0].length;
      }
    }
    if (raised === null || raised === '') {
      plain += '^';
      i++;
      continue;
    }
    readRun(plain, false);
    plain = '';
    readRun(raised, true);
    i = next;
  }
  readRun(plain, false);
  return runs;
}
