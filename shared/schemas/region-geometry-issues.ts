import { GeometryRules, type GeometryIssue } from './geometry-rules';

type Point = { re: string; im: string };
type ParsedRegion =
  | { kind: 'disc'; center: Point; radius: string }
  | { kind: 'box'; min: Point; max: Point }
  | { kind: 'near-cuts'; distance: string };

/**
 * Why a property check's region would hold no point to draw (harness/properties/region-arbitrary.ts
 * answers such a check with an error instead of a verdict): a disc needs a finite centre and a
 * radius above 0, a box finite corners with min below and left of max, near-cuts a distance above 0.
 */
export function regionGeometryIssues(region: ParsedRegion): GeometryIssue[] {
  const rules = new GeometryRules();
  switch (region.kind) {
    case 'disc':
      rules.point(['center'], region.center);
      rules.positive(['radius'], region.radius, 'the disc holds no point');
      break;
    case 'box':
      rules.corners(region.min, region.max, 'box');
      break;
    case 'near-cuts':
      rules.positive(['distance'], region.distance, 'no point lies near the cuts');
      break;
  }
  return rules.issues;
}
