import type { ComplexPair } from '../../adapters/complex-pair';
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
 * the result. complex.js and mathjs values get their parts set after construction, as the
 * adapters do, because some versions' constructors drop a −0 (see with-exact-parts.ts).
 * Stdio targets other than cmath get the request lines of the stdio protocol.
 */
export function reproducer(program: SubjectProgram, target: TargetIdentity, z: ComplexPair, subject: string): string {
  const header = `${target.name}: ${subject} at z = ${pointText(z)}`;
  if (target.library === 'complex.js') return complexJs(program, target, z, header);
  if (target.library === 'mathjs') return mathjs(program, target, z, header);
  if (target.library === 'cmath') return python(program, z, header);
  if (target.library === 'JavaScript Math') return jsMath(program, z, header);
  return stdio(program, target, z, header);
}

function complexJs(program: SubjectProgram, target: TargetIdentity, z: ComplexPair, header: string): string {
  const pkg = String(target.settings.package ?? 'complex.js');
  const lines = [
    `// ${header}`,
    `const Complex = require('${pkg}');`,
    `const c = (re, im) => Object.assign(new Complex(0, 0), { re, im }); // exact parts, −0 included`,
  ];
  const names = stepNames(program, (v) => `c(${jsNumber(v[0])}, ${jsNumber(v[1])})`);
  lines.push(`const z = c(${jsNumber(z[0])}, ${jsNumber(z[1])});`);
  program.steps.forEach((step, i) => {
    if (step.kind !== 'op') return;
    const [a, ...rest] = step.args.map((k) => names[k] as string);
    lines.push(`const s${i} = ${a}.${step.op}(${rest.join(', ')});`);
  });
  lines.push(`console.log(${names[names.length - 1]}.re, ${names[names.length - 1]}.im);`);
  return lines.join('\n');
}

function mathjs(program: SubjectProgram, target: TargetIdentity, z: ComplexPair, header: string): string {
  const pkg = String(target.settings.package ?? 'mathjs');
  const numberEntry = target.settings.entry === 'number';
  const lines = [
    `// ${header}`,
    `const { create, all } = require('${pkg}');`,
    `const math = create(all, { predictable: ${target.settings.predictable === true} });`,
    `const c = (re, im) => Object.assign(math.complex(0, 0), { re, im }); // exact parts, −0 included`,
  ];
  if (numberEntry)
    lines.push(
      `// number entry point: a value with a zero imaginary part goes in as a plain number`,
      `const arg = (v) => (typeof v === 'number' ? v : v.im === 0 ? v.re : v);`,
    );
  const wrap = (name: string) => (numberEntry ? `arg(${name})` : name);
  const names = stepNames(program, (v) => `c(${jsNumber(v[0])}, ${jsNumber(v[1])})`);
  lines.push(`const z = c(${jsNumber(z[0])}, ${jsNumber(z[1])});`);
  program.steps.forEach((step, i) => {
    if (step.kind !== 'op') return;
    const fn = MATHJS_FUNCTION[step.op] ?? step.op;
    const args = step.args.map((k, j) => {
      const s = program.steps[k];
      if (step.op === 'nthroot' && j === 1 && s?.kind === 'const') return jsNumber(s.value[0]);
      return wrap(names[k] as string);
    });
    lines.push(`const s${i} = math.${fn}(${args.join(', ')});`);
  });
  const last = names[names.length - 1];
  lines.push(`console.log(typeof ${last} === 'number' ? [${last}, 0] : [${last}.re, ${last}.im]);`);
  return lines.join('\n');
}

function python(program: SubjectProgram, z: ComplexPair, header: string): string {
  const lines = [`# ${header}`, 'import cmath'];
  const names = stepNames(program, (v) => `complex(${pyNumber(v[0])}, ${pyNumber(v[1])})`);
  lines.push(`z = complex(${pyNumber(z[0])}, ${pyNumber(z[1])})`);
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
