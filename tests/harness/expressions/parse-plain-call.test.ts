import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { parsePlainCall } from '../../../harness/expressions/parse-plain-call';
import { parseSubject } from '../../../harness/expressions/parse-subject';
import { FUNCTION_NAMES } from '../../../shared/function-names';

const SEED = 20261205;
const DEMO = path.join(__dirname, '..', '..', '..', 'suites', 'demo');

/** Every subject and regular-branch g of the demo catalogue. */
function demoSubjects(): string[] {
  const texts = new Set<string>();
  for (const file of readdirSync(DEMO)) {
    const suite = JSON.parse(readFileSync(path.join(DEMO, file), 'utf8')) as {
      subject: string;
      branch: { g?: string };
    };
    texts.add(suite.subject);
    if (suite.branch.g) texts.add(suite.branch.g);
  }
  return [...texts];
}

/**
 * mathjs's reading of a subject: wrapped in parentheses, which parsePlainCall never accepts and
 * the mathjs route unwraps, so the same text goes the slow way. Undefined when it refuses the text.
 */
function throughMathjs(text: string): unknown {
  try {
    return parseSubject(`(${text})`);
  } catch {
    return undefined;
  }
}

describe('parsePlainCall', () => {
  it('reads every demo subject it accepts exactly as mathjs does, and accepts every principal one without an operator', () => {
    const accepted = demoSubjects().filter((text) => {
      const plain = parsePlainCall(text);
      if (plain) expect(plain).toEqual(throughMathjs(text));
      return plain !== null;
    });
    expect(accepted).toEqual(
      expect.arrayContaining(['z', 'sqrt(z)', 'acsch(z)', 'nthroot(z, 5)', 'pow(z, 1/3)', 'log(z)', 'exp(z)']),
    );
    expect(accepted).not.toContain('pow(z, 0.5 + 2i)');
  });

  it(`gives either nothing or mathjs's own reading of any text built from calls, numbers and spaces (seed ${SEED})`, () => {
    const space = fc.constantFrom('', ' ', '  ', '\t');
    const name = fc.constantFrom(...FUNCTION_NAMES, 'sin', 'Sqrt', 'pow', 'nthroot', 'z');
    const number = fc.constantFrom('0', '1', '5', '-3', '- 2', '007', '1000', '1001', '-1000', '2.5', '1e3', '2i');
    const argument = fc.oneof(
      fc.constant('z'),
      fc.constant('Z'),
      fc.tuple(number, fc.constantFrom('', '/3', '/0', ' / 4', '/-2')).map(([a, b]) => `z, ${a}${b}`),
      fc.tuple(space, number).map(([s, a]) => `z,${s}${a}`),
    );
    const text = fc
      .tuple(space, name, space, argument, space, fc.constantFrom(')', '', '))'))
      .map(([a, n, b, arg, c, close]) => `${a}${n}${b}(${arg}${c}${close}`);
    fc.assert(
      fc.property(text, (t) => {
        const plain = parsePlainCall(t);
        return plain === null || JSON.stringify(plain, bigints) === JSON.stringify(throughMathjs(t), bigints);
      }),
      { seed: SEED, numRuns: 600, verbose: true },
    );
  });

  it('reads a principal demo subject without loading mathjs', () => {
    jest.isolateModules(() => {
      jest.doMock('mathjs', () => {
        throw new Error('mathjs was loaded');
      });
      const { parseSubject: fresh } = require('../../../harness/expressions/parse-subject') as {
        parseSubject: typeof parseSubject;
      };
      for (const text of ['sqrt(z)', 'acoth(z)', 'pow(z, 1/3)', 'nthroot(z, 5)', 'z'])
        expect(() => fresh(text)).not.toThrow();
      expect(() => fresh('sqrt(z - 1)')).toThrow('mathjs was loaded');
    });
  });
});

function bigints(_key: string, value: unknown): unknown {
  return typeof value === 'bigint' ? `${value}n` : value;
}
