import { formatComplexText } from './format-complex-text';
import type { PropertyOutcome } from './property-outcome';

/** One library value of a failed law: which side of the law it is (if either), its name and its text. */
interface PropertyFailureValue {
  side: 'left side' | 'right side' | null;
  name: string;
  text: string;
}

/**
 * What every output shows of a failed property check (the CLI's table and JUnit through
 * propertyFailureLines, the run screen as rows): the shrunk counterexample, the library's values
 * that show the failure with the law's left and right sides marked, and how to replay it with
 * fast-check (the pinned seed and the path of the shrunk case). `ascii` as in formatComplexText,
 * for outputs that programs read.
 */
export function propertyFailureParts(
  o: Extract<PropertyOutcome, { kind: 'failed' }>,
  options: { ascii?: boolean } = {},
): { counterexample: string; values: PropertyFailureValue[]; replay: string } {
  const points = o.counterexample.map(
    (z, i) => `${o.counterexample.length > 1 ? `z${i + 1}` : 'z'} = ${formatComplexText(z, options)}`,
  );
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  return {
    counterexample: `counterexample (shrunk ${plural(o.shrinks, 'time')}, after ${plural(o.runs, 'run')}): ${points.join(', ') || 'none'}`,
    values: o.values.map((v) => ({
      side: v.name === o.sides?.[0] ? 'left side' : v.name === o.sides?.[1] ? 'right side' : null,
      name: v.name,
      text: formatComplexText(v.value, options),
    })),
    replay: `replay with fast-check: seed ${o.seed}, path "${o.path}"`,
  };
}
