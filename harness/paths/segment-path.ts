import { geometryPoint } from './geometry-point';
import { lerpComponent } from './lerp-component';
import type { PathPoint } from './path-point';
import type { PathSpec } from './path-spec';
import { sampleParameters } from './sample-parameters';

/** Points of the segment from `from` (t = 0, exactly) to `to` (t = 1, exactly); see lerp-component.ts. */
export function segmentPath(spec: Extract<PathSpec, { kind: 'segment' }>): PathPoint[] {
  const a = geometryPoint(spec.from, 'from');
  const b = geometryPoint(spec.to, 'to');
  return sampleParameters(spec).map((t) => ({
    t,
    z: { re: lerpComponent(a.re, b.re, t), im: lerpComponent(a.im, b.im, t) },
  }));
}
