/**
 * How the other values of a multivalued function relate to its principal value v
 * (DLMF §4.2(i) and 4.2.6 for log; §4.2(iv), §4.23(i)–(ii), §4.37(i)–(ii) for the others,
 * whose general-value formulas were not checked equation by equation against the text):
 * - `power`: v·e^{2πiνk} for z^ν (roots, powers, regular branches of g^ν);
 * - `log`: v + 2πik;
 * - `asin`: (−1)^k v + kπ; `acos`: v + 2kπ; `atan`: v + kπ;
 * - `asinh`: (−1)^k v + ikπ; `acosh`: v + 2ikπ; `atanh`: v + ikπ.
 * (acos and acosh also have −v + 2kπ and −v + 2ikπ, which one k cannot name; they are left out.)
 * `sign` −1 says the subject is the negation of that function; `ks` are the sheets tried.
 */
export type SheetFamily =
  | { kind: 'power'; nu: [number, number]; ks: number[]; sign: 1 | -1 }
  | { kind: 'log' | 'asin' | 'acos' | 'atan' | 'asinh' | 'acosh' | 'atanh'; ks: number[]; sign: 1 | -1 };
