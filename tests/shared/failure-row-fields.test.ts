import { FAILURE_ROW_FIELDS } from '../../shared/failure-row-fields';
import type { Diagnosis } from '../../shared/diagnosis';
import type { PointFinding } from '../../shared/run-result';

/** The columns a finding fills, as the shard executor stores them (storeResult reads the same list). */
const columnsOf = (f: PointFinding) =>
  Object.fromEntries(FAILURE_ROW_FIELDS.flatMap((d) => ('fromFinding' in d ? [[d.key, d.fromFinding(f)]] : [])));

const base: Omit<PointFinding, 'outcome'> = {
  path: 'on the cut',
  index: 3,
  t: 0.5,
  z: { re: '-1', im: '0' },
  zHex: { re: '-0x1p+0', im: '0x0p+0' },
  expected: { re: '0', im: '3.141592653589793' },
  actual: { re: '-1.96e-15', im: '3.141592653589793' },
  rule: 'DLMF 4.2.3',
  reproducer: 'x',
};

describe('FAILURE_ROW_FIELDS reading a finding', () => {
  it('keeps every label, the leading one as the diagnosis, and the class of the point', () => {
    const zeroSign: Diagnosis = { kind: 'zero-sign', part: 'im', of: 'input' };
    const inaccurate: Diagnosis = {
      kind: 'inaccurate',
      ulps: 104212,
      relativeError: 2e-11,
      part: 're',
      parts: { re: { ulps: 104212, absolute: 1.96e-15 }, im: { ulps: 0, absolute: 0 } },
    };
    const columns = columnsOf({
      ...base,
      outcome: {
        kind: 'fail',
        diagnosis: zeroSign,
        labels: [zeroSign, inaccurate],
        ulps: 104212,
        relativeError: 2e-11,
      },
    });
    expect(columns).toMatchObject({
      diagnosisKind: 'zero-sign',
      diagnosis: zeroSign,
      labels: [zeroSign, inaccurate],
      findingClass: 'branch',
    });
  });

  it('reads a finding of one label, as stored before there were several, as that one label', () => {
    const d: Diagnosis = { kind: 'inaccurate', ulps: 12, relativeError: 1.6e-16 };
    const columns = columnsOf({ ...base, outcome: { kind: 'fail', diagnosis: d, ulps: 12, relativeError: 1.6e-16 } });
    expect(columns).toMatchObject({ labels: [d], findingClass: 'accuracy' });
  });

  it('keeps the steps of a composed subject, the first step that left the reference and a convention choice', () => {
    const steps = [
      { text: 'pow(z, 13)', library: { re: '-1', im: '-1.96e-15' }, reference: { re: '-1', im: '0' }, left: true },
      {
        text: 'log(…)',
        library: { re: '0', im: '-3.141592653589793' },
        reference: { re: '0', im: '3.14' },
        left: true,
      },
    ];
    const columns = columnsOf({
      ...base,
      outcome: { kind: 'fail', diagnosis: { kind: 'cut-side' }, ulps: 1e18, relativeError: 2 },
      steps,
      firstLeftStep: 0,
      choice: 'acsc(0) = acsc(0 + 0i) through 1/z = +∞: the choice of C Annex G arithmetic',
    });
    expect(columns).toMatchObject({ steps, firstLeftStep: 0, choice: expect.stringContaining('Annex G') });
  });

  it('leaves labels empty and the class null for an error', () => {
    expect(columnsOf({ ...base, outcome: { kind: 'error', message: 'threw' } })).toMatchObject({
      labels: [],
      findingClass: null,
      steps: null,
      firstLeftStep: null,
      choice: null,
    });
  });
});
