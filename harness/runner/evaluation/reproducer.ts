import type { ComplexPair } from '../../adapters/complex-pair';
import { complexString } from '../../adapters/complex-string';
import { findEntry } from '../../adapters/find-entry';
import type { TargetEntry } from '../../../shared/target-entry';
import type { TargetIdentity } from '../../../shared/target-identity';
import { formatHexDouble } from '../../checks/format-hex-double';
import { pointText } from '../formats/point-text';
import type { SubjectProgram } from './subject-program';

/** A double as a JavaScript literal that reads back to exactly the same double ("-0" kept). */
const jsNumber = (x: number): string =>
  Number.isNaN(x)
    ? 'NaN'
    : x === Infinity
      ? 'Infinity'
      : x === -Infinity
        ? '-Infinity'
        : Object.is(x, -0)
          ? '-0'
          : String(x);
const pyNumber = (x: number): string => `float.fromhex('${formatHexDouble(x)}')`;

const MATHJS_FUNCTION: Readonly<Record<string, string>> = {
  nthroot: 'nthRoot',
  add: 'add',
  sub: 'subtract',
  mul: 'multiply',
  div: 'divide',
  neg: 'unaryMinus',
};
const PYTHON_OPERATOR: Readonly<Record<string, string>> = { add: '+', sub: '-', mul: '*', div: '/', pow: '**' };

/**
 * Code to paste into the target's language that makes exactly the calls the harness made for
 * one point: the input with its exact bits (JavaScript literals read back exactly; Python gets
 * float.fromhex), every step of the subject with the library's own operation, and a print of
 * the result. Values are built through the entry the harness used (shared/target-entry.ts), the
 * input and the constants alike, and never patched: a constructor that drops a −0 drops it here
 * too. Stdio targets other than cmath get the request lines of the stdio protocol.
 */
export function reproducer(
  program: SubjectProgram,
  target: TargetIdentity,
  z: ComplexPair,
  subject: string,
  entryName?: string,
): string {
  const found = findEntry(target, entryName);
  const entry = found instanceof Error ? findEntry(target) : found;
  const header = `${target.name}: ${subject} at z = ${pointText(z)}, built through the ${(entry as TargetEntry).name} entry`;
  if (target.library === 'complex.js') return complexJs(program, target, z, header, entry as TargetEntry);
  if (target.library === 'mathjs') return mathjs(program, target, z, header, entry as TargetEntry);
  if (target.library === 'cmath') return python(program, z, header, entry as TargetEntry);
  if (target.library === 'JavaScript Math') return jsMath(program, z, header);
  return stdio(program, target, z, header);
}

/** A JavaScript expression that builds [re, im] the way an entry's `call` says ("new Complex(re, im)", "math.complex({ re, im })"). */
function jsBuild(entry: TargetEntry, [re, im]: readonly [number, number]): string {
  const [r, i] = [jsNumber(re), jsNumber(im)];
  const text = JSON.stringify(complexString([re, im]));
  // mathjs's number entry takes a value that is not real as math.complex (mathjs-entry-ways.ts).
  if (entry.call === 're as a plain number' && im !== 0) return `math.complex(${r}, ${i})`;
  return entry.call
    .replace('({ re, im })', `({ re: ${r}, im: ${i} })`)
    .replace('([re, im])', `([${r}, ${i}])`)
    .replace('(re, im)', `(${r}, ${i})`)
    .replace('("re±im i")', `(${text})`)
    .replace('re as a plain number', r);
}

/** One library's reproducer: the program at z, its values built through `entry`. */
type LibraryReproducer = (
  program: SubjectProgram,
  target: TargetIdentity,
  z: ComplexPair,
  header: string,
  entry: TargetEntry,
) => string;

const complexJs: LibraryReproducer = (program, target, z, header, entry) => {
  const pkg = String(target.settings.package ?? 'complex.js');
  const lines = [`// ${header}`, `const Complex = require('${pkg}');`];
  const names = stepNames(program, (v) => jsBuild(entry, v));
  lines.push(`const z = ${jsBuild(entry, z)};`);
  program.steps.forEach((step, i) => {
    if (step.kind !== 'op') return;
    const [a, ...rest] = step.args.map((k) => names[k] as string);
    lines.push(`const s${i} = ${a}.${step.op}(${rest.join(', ')});`);
  });
  lines.push(`console.log(${names[names.length - 1]}.re, ${names[names.length - 1]}.im);`);
  return lines.join('\n');
};

const mathjs: LibraryReproducer = (program, target, z, header, entry) => {
  const pkg = String(target.settings.package ?? 'mathjs');
  const lines = [
    `// ${header}`,
    `const { create, all } = require('${pkg}');`,
    `const math = create(all, { predictable: ${target.settings.predictable === true} });`,
  ];
  const names = stepNames(program, (v) => jsBuild(entry, v));
  lines.push(`const z = ${jsBuild(entry, z)};`);
  program.steps.forEach((step, i) => {
    if (step.kind !== 'op') return;
    const fn = MATHJS_FUNCTION[step.op] ?? step.op;
    const args = step.args.map((k, j) => {
      const s = program.steps[k];
      if (step.op === 'nthroot' && j === 1 && s?.kind === 'const') return jsNumber(s.value[0]);
      return names[k] as string;
    });
    lines.push(`const s${i} = math.${fn}(${args.join(', ')});`);
  });
  const last = names[names.length - 1];
  lines.push(`console.log(typeof ${last} === 'number' ? [${last}, 0] : [${last}.re, ${last}.im]);`);
  return lines.join('\n');
};

/** Python's complex() of the string form, as the cmath adapter builds it ("-4-0j", "inf+nanj"). */
const pyText = (z: ComplexPair): string =>
  JSON.stringify(
    complexString(z)
      .replace(/Infinity/g, 'inf')
      .replace(/NaN/g, 'nan')
      .replace(/i$/, 'j'),
  );

function python(program: SubjectProgram, z: ComplexPair, header: string, entry: TargetEntry): string {
  const lines = [`# ${header}`, 'import cmath'];
  const build = (v: readonly [number, number]): string =>
    entry.name === 'string' ? `complex(${pyText([v[0], v[1]])})` : `complex(${pyNumber(v[0])}, ${pyNumber(v[1])})`;
  const names = stepNames(program, build);
  lines.push(`z = ${build(z)}`);
  program.steps.forEach((step, i) => {
    if (step.kind !== 'op') return;
    const args = step.args.map((k) => names[k] as string);
    const operator = PYTHON_OPERATOR[step.op];
    const expr = operator
      ? `${args[0]} ${operator} ${args[1]}`
      : step.op === 'neg'
        ? `-${args[0]}`
        : `cmath.${step.op}(${args.join(', ')})`;
    lines.push(`s${i} = ${expr}`);
  });
  const last = names[names.length - 1];
  lines.push(`print(${last}, ${last}.real.hex(), ${last}.imag.hex())`);
  return lines.join('\n');
}

function jsMath(program: SubjectProgram, z: ComplexPair, header: string): string {
  const lines = [`// ${header} (real arguments only)`, `const z = ${jsNumber(z[0])};`];
  const infix: Record<string, string> = { add: '+', sub: '-', mul: '*', div: '/' };
  const names = stepNames(program, (v) => jsNumber(v[0]));
  program.steps.forEach((step, i) => {
    if (step.kind !== 'op') return;
    const args = step.args.map((k) => names[k] as string);
    const expr = infix[step.op]
      ? `${args[0]} ${infix[step.op]} ${args[1]}`
      : step.op === 'neg'
        ? `-${args[0]}`
        : `Math.${step.op}(${args.join(', ')})`;
    lines.push(`const s${i} = ${expr};`);
  });
  lines.push(`console.log(${names[names.length - 1]});`);
  return lines.join('\n');
}

function stdio(program: SubjectProgram, target: TargetIdentity, z: ComplexPair, header: string): string {
  const wire = (p: ComplexPair) => [formatHexDouble(p[0]), formatHexDouble(p[1])];
  const lines = [`# ${header}: stdio protocol requests, one per step (docs/stdio-protocol.md)`];
  const command = String(target.settings.command ?? '<adapter command>');
  const known = new Map<number, ComplexPair>([[0, z]]);
  program.steps.forEach((step, i) => {
    if (step.kind === 'const') known.set(i, step.value);
    if (step.kind !== 'op') return;
    const args = step.args.map((k) =>
      known.has(k) ? JSON.stringify(wire(known.get(k) as ComplexPair)) : `<result of step ${k}>`,
    );
    const item = args.length === 1 ? args[0] : `[${args.join(', ')}]`;
    lines.push(`echo '{"id": ${i}, "op": "${step.op}", "args": [${item}]}' | ${command}`);
  });
  return lines.join('\n');
}

/** What each step of the program is called in the reproducer: the input z, a constant written out, or the intermediate s<i>. */
function stepNames(program: SubjectProgram, constant: (value: readonly [number, number]) => string): string[] {
  return program.steps.map((step, i) =>
    step.kind === 'input' ? 'z' : step.kind === 'const' ? constant(step.value) : `s${i}`,
  );
}
