import type * as MathJs from 'mathjs';

let parser: ((text: string) => MathJs.MathNode) | null = null;

/**
 * mathjs's parser with BigNumber constants, so "0.1" reaches us as the decimal it was written as.
 * Loaded on first use: `require('mathjs')` costs ~1.1 s (docs/conventions.md), 0.6–0.7 s of the
 * compiled CLI's 0.8 s for one principal demo suite (docs/cli-package.md), which neither
 * `sheetkeeper reference` nor a subject parsePlainCall reads needs.
 */
export function mathParse(text: string): MathJs.MathNode {
  if (!parser) {
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- loaded on first use: mathjs costs ~1.1 s
    const { all, create } = require('mathjs') as typeof MathJs;
    const math = create(all as NonNullable<typeof all>, { number: 'BigNumber', precision: 64 });
    parser = (t) => math.parse(t);
  }
  return parser(text);
}
