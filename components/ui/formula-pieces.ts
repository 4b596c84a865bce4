/** A run of a formula's text with how it is set: raised (an exponent), lowered (an index) or in italics (a variable). */
export interface FormulaPiece {
  text: string;
  place: 'line' | 'sup' | 'sub';
  italic: boolean;
}

/**
 * One-letter names set in italics as variables (z, w, g, the exponent ν, a sheet k, the counts Z
 * and P of zeros and poles…); i, e and π are constants and stay upright (ISO 80000-2).
 */
const VARIABLES = new Set(['z', 'w', 'g', 'f', 'k', 'm', 'n', 't', 'x', 'y', 'ν', 'Z', 'P']);
const CONSTANTS = new Set(['i', 'e', 'π']);
const LETTER = /[A-Za-zα-ωΑ-Ω]/;
const GREEK = /[α-ωΑ-Ω]/;
const MINUS = '\u2212';

/**
 * Reads a formula as written in the product's texts and suites — `(z^2 - 1)^(1/3)`,
 * `e^{2πi·2/3}`, `principal·e^(2πiνk)`, `f(z0)` — into pieces to set: `^{…}`, `^(…)` and `^`
 * before a number or a name raise what follows (the braces or parentheses go, the raise delimits
 * it); a digit run right after a one-letter variable is its index (z0 → z₀); one-letter variables
 * are italic; a hyphen that is a minus (alone between spaces, or before a number or name at the
 * start, after "(", ",", "=" or a space) becomes U+2212, and `*` becomes "·". Words, hyphenated
 * words ("counter-clockwise") and numbers such as 1e-9 are left as they are. With
 * `variables: false` only the raising is done: text that quotes what someone typed ("with -1
 * the circle has no points") keeps every character as typed.
 */
export function formulaPieces(text: string, { variables = true }: { variables?: boolean } = {}): FormulaPiece[] {
  const out: FormulaPiece[] = [];
  const push = (piece: string, place: FormulaPiece['place'], italic = false) => {
    if (piece === '') return;
    const last = out[out.length - 1];
    if (last && last.place === place && last.italic === italic) last.text += piece;
    else out.push({ text: piece, place, italic });
  };
  const setLine = (run: string, place: FormulaPiece['place']) => {
    let i = 0;
    while (i < run.length) {
      const c = run[i]!;
      if (!variables) {
        push(c, place);
        i++;
        continue;
      }
      if (LETTER.test(c)) {
        let j = i;
        while (j < run.length && LETTER.test(run[j]!)) j++;
        const word = run.slice(i, j);
        // A run with a Greek letter is a product (2πiνk), set letter by letter; other runs are names (exp, sqrt) or words.
        if (word.length > 1 && GREEK.test(word) && [...word].every((l) => VARIABLES.has(l) || CONSTANTS.has(l))) {
          for (const l of word) push(l, place, VARIABLES.has(l));
          i = j;
          continue;
        }
        if (word.length === 1 && VARIABLES.has(word)) {
          push(word, place, true);
          let k = j;
          while (k < run.length && /[0-9]/.test(run[k]!)) k++;
          // An index only on the line: z0 is z₀, but a raised 2k stays as it is.
          if (k > j && place === 'line' && (k === run.length || !LETTER.test(run[k]!))) {
            push(run.slice(j, k), 'sub');
            j = k;
          }
        } else push(word, place);
        i = j;
        continue;
      }
      if (c === '-') {
        const before = i === 0 ? '' : run[i - 1]!;
        const after = run[i + 1] ?? '';
        const minus =
          (before === ' ' && after === ' ') ||
          ((before === '' || /[\s(,=[{^]/.test(before)) && /[0-9A-Za-zα-ω(π∞.]/.test(after));
        push(minus ? MINUS : c, place);
      } else if (c === '*') push('·', place);
      else push(c, place);
      i++;
    }
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
      const m = /^[-−]?(?:[0-9]+(?:\.[0-9]+)?|[A-Za-zα-ωπ][0-9]*)/.exec(text.slice(i + 1));
      if (m) {
        raised = m[0];
        next = i + 1 + m[0].length;
      }
    }
    if (raised === null) {
      plain += '^';
      i++;
      continue;
    }
    setLine(plain, 'line');
    plain = '';
    setLine(raised, 'sup');
    i = next;
  }
  setLine(plain, 'line');
  return out;
}
