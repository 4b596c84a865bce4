import type { ComplexPair } from '../../../../harness/adapters/complex-pair';
import { evaluateSuite } from '../../../../harness/runner/evaluation/evaluate-suite';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { makeSuite } from '../support/make-suite';
import { referenceTarget } from '../support/reference-target';
import { sqrtBranch } from '../support/sqrt-branch';

/** √z as the branch of z^(1/2) with f(1) = 1 and the cut (−∞, 0]; a unit circle around 0 has monodromy e^{iπ} = −1. */
const suite = makeSuite({
  subject: 'sqrt(z)',
  branch: sqrtBranch,
  tolerances: { values: { relative: 1e-14 }, monodromy: { relative: 1e-12 } },
  paths: [{ kind: 'circle', name: 'unit circle', center: { re: '0', im: '0' }, radius: '1', samples: 65 }],
});
const cache = seededReferenceCache();
const below = ([, im]: ComplexPair) => im < 0 || Object.is(im, -0);

async function monodromyOf(fault?: (op: string, args: ComplexPair[], v: [number, number]) => [number, number]) {
  const r = await evaluateSuite(suite, referenceTarget('lib@1', fault), { cache });
  return r.paths[0]!.monodromy!;
}

describe('monodromy along closed paths', () => {
  it('reads −1 from a correct square root, whose values jump once by −1 where the circle crosses the cut', async () => {
    const m = await monodromyOf();
    expect(m).toMatchObject({ expected: { re: '-1', im: '0' }, pass: true });
    expect(Number(m.library!.re)).toBeCloseTo(-1, 14);
  });

  it('reads −1 from a square root cut along the positive axis: the monodromy belongs to the branch structure, not to where the cut is', async () => {
    const m = await monodromyOf((op, [z], v) => (op === 'sqrt' && below(z!) ? [-v[0], -v[1]] : v));
    expect(m.pass).toBe(true);
  });

  it('fails a library whose values never jump (the identity): its loop closes with factor 1, not −1', async () => {
    const m = await monodromyOf((op, [z]) => (op === 'sqrt' ? [z![0], z![1]] : [0, 0]));
    expect(m).toMatchObject({ expected: { re: '-1', im: '0' }, library: { re: '1', im: '-0' }, pass: false });
  });

  it('fails a library whose jump is no value of e^{2πiνk}, and says where it jumped', async () => {
    const turn: [number, number] = [Math.cos(Math.PI / 3), Math.sin(Math.PI / 3)];
    const m = await monodromyOf((op, [z], v) =>
      op === 'sqrt' && below(z!) ? [v[0] * turn[0] - v[1] * turn[1], v[0] * turn[1] + v[1] * turn[0]] : v,
    );
    expect(m.pass).toBe(false);
    expect(m.library).toBeNull();
    expect(m.note).toMatch(/jumps at t ≈ 0\.5\d* by a factor .* which is no e\^\{2πiνk\}/);
  });
});
