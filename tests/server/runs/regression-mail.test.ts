import { regressionMail } from '../../../server/runs/regression-mail';
import type { RegressionRow } from '../../../server/runs/regression-row';

// exp(3 − 0i) = e³ − 0i under Annex G (ISO/IEC 9899:2011 G.6.3.1: cexp(conj(z)) = conj(cexp(z))),
// the value complex.js 2.4.1+ returns with +0 (seen with `sheetkeeper matrix --library complex.js`).
const row = (id: string): RegressionRow => ({
  id,
  suiteSlug: 'exp-principal-sz',
  targetName: 'complex.js@2.4.3',
  pathName: 'wide circle',
  z: { re: '3', im: '-0' },
  zHex: { re: '0x1.8p+1', im: '-0x0p+0' },
  expected: { re: '20.085536923187668', im: '-0' },
  actual: { re: '20.085536923187668', im: '0' },
  diagnosis: { kind: 'zero-sign', of: 'input', part: 'im' } as RegressionRow['diagnosis'],
  rule: 'ISO/IEC 9899:2011 G.6.3.1: cexp(conj(z)) = conj(cexp(z))',
  reproducer: 'new Complex(3, -0).exp()',
});

describe('regressionMail', () => {
  const mail = regressionMail({
    recipients: ['kwame@sheetkeeper.test'],
    planName: 'complex.js nightly',
    runId: 'run-1',
    appUrl: 'http://127.0.0.1:8460',
    rows: [row('41'), row('42')],
    total: 2,
    versionChanges: [{ key: 'complex.js', from: '2.3.0', to: '2.4.3' }],
  });

  it('lists every regression with input bits, expected and actual, diagnosis, rule and reproducer in both parts', () => {
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain('0x1.8p+1');
      expect(part).toContain('-0x0p+0');
      expect(part).toContain('20.085536923187668');
      expect(part).toMatch(/zero sign/);
      expect(part).toContain('G.6.3.1');
      expect(part).toMatch(/new Complex\(3, -0\)\.exp\(\)/);
      expect(part).toContain('2.3.0');
    }
    expect(mail.subject).toBe('[Sheetkeeper] 2 regressions in complex.js nightly');
  });

  it('writes inputs such as 3 − 0i and −0 − 2i and the values with their zero signs, one U+2212 minus per part, as the app does', () => {
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain('z = 3 − 0i');
      expect(part).toContain('20.085536923187668 − 0i');
      expect(part).toContain('20.085536923187668 + 0i');
      expect(part).not.toContain('+ -');
    }
    const onAxis = regressionMail({
      recipients: ['a@b.test'],
      planName: 'p',
      runId: 'r',
      appUrl: 'http://127.0.0.1:8460',
      rows: [{ ...row('9'), z: { re: '-0', im: '-2' } }],
      total: 1,
      versionChanges: [],
    });
    for (const part of [onAxis.text, onAxis.html]) expect(part).toContain('z = −0 − 2i');
  });

  it("links each case to the app's case page", () => {
    for (const id of ['41', '42']) {
      expect(mail.text).toContain(`http://127.0.0.1:8460/failures/${id}`);
      expect(mail.html).toContain(`href="http://127.0.0.1:8460/failures/${id}"`);
    }
  });

  it('lays each regression out in rows of at most two cells, so a phone shows it without scrolling sideways', () => {
    const rows = [...mail.html.matchAll(/<tr>([\s\S]*?)<\/tr>/g)].map((m) => (m[1]!.match(/<t[hd][ >]/g) ?? []).length);
    expect(rows.length).toBeGreaterThanOrEqual(2 * 8);
    expect(Math.max(...rows)).toBeLessThanOrEqual(2);
  });

  it('says which part of an inaccurate value is off, and when its sign is the opposite', () => {
    // mpmath, 60 digits: Re asech(1000001 + 1e−9i) = 9.99998e−22; −5.55e−17 is what complex.js 2.4.3 returned in our demo runs.
    const inaccurate: RegressionRow = {
      ...row('7'),
      diagnosis: {
        kind: 'inaccurate',
        ulps: 8.656731785528058e18,
        relativeError: 3.534e-17,
        part: 're',
        signDiffers: true,
      },
    };
    const m = regressionMail({
      recipients: ['a@b.test'],
      planName: 'p',
      runId: 'r',
      appUrl: 'http://127.0.0.1:8460',
      rows: [inaccurate],
      total: 1,
      versionChanges: [],
    });
    for (const part of [m.text, m.html])
      expect(part).toContain(
        'inaccurate (8.7e+18 ulps in the real part, which has the opposite sign; relative error of the whole value 3.5e-17)',
      );
  });

  it('escapes what it puts into HTML', () => {
    const html = regressionMail({
      recipients: ['a@b.test'],
      planName: '<script>x</script>',
      runId: 'r',
      appUrl: 'http://127.0.0.1:8460',
      rows: [row('1')],
      total: 1,
      versionChanges: [],
    }).html;
    expect(html).not.toContain('<script>');
    expect(html).toContain('&lt;script&gt;');
  });
});
