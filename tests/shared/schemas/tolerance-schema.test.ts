import { toleranceSchema } from '../../../shared/schemas/tolerance-schema';

describe('toleranceSchema', () => {
  it('accepts ulps per part, a normwise relative error, or both', () => {
    expect(toleranceSchema.parse({ ulps: 4 })).toEqual({ ulps: 4 });
    expect(toleranceSchema.parse({ relative: 1e-14 })).toEqual({ relative: 1e-14 });
    expect(toleranceSchema.parse({ ulps: 4, relative: 8.881784197001252e-16 })).toEqual({
      ulps: 4,
      relative: 8.881784197001252e-16,
    });
  });

  it('names the rule a tolerance breaks (every rule for a two-bound one) and refuses unknown fields', () => {
    const messages = (v: unknown) => {
      const r = toleranceSchema.safeParse(v);
      return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')} ${i.message}`);
    };
    expect(messages({ ulps: -1 })).toEqual(['ulps must be at least 0']);
    const both = ' must be {"ulps": n} with 0 ≤ n ≤ 2^52, {"relative": x} with 0 < x ≤ 1, or both';
    expect(messages({ ulps: -1, relative: 1e-15 })).toEqual([both]);
    expect(messages({ ulps: 4, relative: 0 })).toEqual([both]);
    expect(messages({ ulps: 4, relative: 1e-15, digits: 3 })).not.toEqual([]);
    expect(messages({})).not.toEqual([]);
  });
});
