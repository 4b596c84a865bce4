import type { SuitePath } from '../../shared/schemas/suite-path-schema';
import { formatComplexText } from '../../shared/format-complex-text';

/**
 * A path in one line of words, e.g. "circle around 0 + 0i, radius 2, from angle π/8, 1 turn ↺
 * counter-clockwise, 65 samples" (angles written `pi/8` in the suite read as π/8).
 */
export function describeSuitePath(p: SuitePath): string {
  const sampled = (s: { samples?: number; at?: string[] }) =>
    s.at ? `at t = ${s.at.join(', ')}` : `${s.samples} samples`;
  switch (p.kind) {
    case 'circle':
      return `circle around ${formatComplexText(p.center)}, radius ${p.radius}, from angle ${p.start_angle.replace(/pi/g, 'π')}, ${p.turns} ${p.turns === '1' ? 'turn' : 'turns'} ${p.direction === 'ccw' ? '↺ counter-clockwise' : '↻ clockwise'}, ${sampled(p)}`;
    case 'segment':
      return `segment from ${formatComplexText(p.from)} to ${formatComplexText(p.to)}, ${sampled(p)}`;
    case 'polyline':
      return `polyline through ${p.points.map((z) => formatComplexText(z)).join(' → ')}, ${sampled(p)}`;
    case 'points':
      return `${p.points.length === 1 ? 'the point' : `${p.points.length} points`} ${p.points.map((z) => formatComplexText(z)).join(', ')}, each once`;
    case 'straddle':
      return `straddles the ${p.cut.kind === 'segment' ? `segment ${formatComplexText(p.cut.from)} to ${formatComplexText(p.cut.to)}` : `ray from ${formatComplexText(p.cut.from)} through ${formatComplexText(p.cut.through)}`} at ${p.along.join(', ')} along it, offsets ${p.offsets.join(', ')} on both sides and ±0 on it`;
    case 'grid':
      return `grid ${p.columns} × ${p.rows} from ${formatComplexText(p.min)} to ${formatComplexText(p.max)}`;
  }
}
