import { describeSuitePath } from '../../../components/suites/describe-suite-path';
import { suiteSchema } from '../../../shared/schemas/suite-schema';
import sqrtDemo from '../../../suites/demo/sqrt-principal-sz.json';

const paths = suiteSchema.parse(sqrtDemo).paths;
const path = (name: string) => paths.find((p) => p.name === name)!;

describe('describeSuitePath', () => {
  it('writes an angle in π, not as the suite spells it', () => {
    expect(describeSuitePath(path('wide circle'))).toBe(
      'circle around 0 + 0i, radius 3, from angle π/8, 1 turn ↺ counter-clockwise, 49 samples',
    );
  });

  it('says where along its cut a straddle crosses', () => {
    expect(describeSuitePath(path('straddle cut 1'))).toMatch(
      /^straddles the ray from 0 \+ 0i through −1 \+ 0i at 0\.5, 1, 3, 1e6 along it, offsets .* on both sides and ±0 on it$/,
    );
  });
});
