import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { DEMO_COMPOSED_SUITES } from '../../../scripts/demo-catalogue/demo-composed-suites';
import { demoCatalogue } from '../../../scripts/demo-catalogue/demo-catalogue';
import { FUNCTION_NAMES } from '../../../shared/function-names';
import { suiteJsonSchema } from '../../../shared/suite-json-schema';
import { validateSuite } from '../../../shared/validate-suite';

const DIR = path.join(__dirname, '..', '..', '..', 'suites', 'demo');
const files = readdirSync(DIR).filter((f) => f.endsWith('.json'));
const onDisk = files.map((f) => ({ file: f, data: JSON.parse(readFileSync(path.join(DIR, f), 'utf8')) as unknown }));

describe('the demo catalogue in suites/demo', () => {
  it('validates every file with the shared schema, under a file name equal to its id', () => {
    for (const { file, data } of onDisk) {
      const checked = validateSuite(data, file);
      expect({ file, issues: checked.ok ? [] : checked.issues }).toEqual({ file, issues: [] });
      if (checked.ok) expect(`${checked.suite.id}.json`).toBe(file);
    }
  });

  it('is exactly what `npm run suites:demo` writes', () => {
    const generated = Object.fromEntries(demoCatalogue().map((s) => [`${s.id}.json`, s]));
    expect(Object.fromEntries(onDisk.map(({ file, data }) => [file, data]))).toEqual(
      JSON.parse(JSON.stringify(generated)),
    );
  });

  it('names a branch in a title only where there is one to choose, and says "principal" at most once', () => {
    const titles = onDisk.map(({ data }) => (data as { title: string }).title);
    expect(titles).toContain('Exponential, single-valued (no cut), signed zeros (Annex G)');
    expect(titles).toContain('Cube root, principal branch, counter-clockwise continuity');
    for (const title of titles) {
      expect({ title, principal: (title.match(/principal/gi) ?? []).length <= 1 }).toEqual({ title, principal: true });
      expect(title).not.toMatch(/no cut\)?, principal branch/);
    }
  });

  it('holds at least 15 suites, at least 5 of them regular branches', () => {
    const suites = onDisk.map(({ data }) => data as { branch: { kind: string } });
    expect(suites.length).toBeGreaterThanOrEqual(15);
    expect(suites.filter((s) => s.branch.kind === 'regular').length).toBeGreaterThanOrEqual(5);
  });

  it('tests every catalogue function under both conventions', () => {
    const principal = onDisk
      .map(({ data }) => data as { subject: string; convention: string; branch: { kind: string } })
      .filter((s) => s.branch.kind === 'principal');
    for (const fn of FUNCTION_NAMES) {
      for (const convention of ['signed-zero', 'counter-clockwise']) {
        expect({
          fn,
          convention,
          found: principal.some((s) => s.subject.startsWith(`${fn}(`) && s.convention === convention),
        }).toEqual({ fn, convention, found: true });
      }
    }
  });

  it('straddles every cut of a catalogue function’s principal suite at 1e-3, 1e-9, 1e-300 and 5e-324', () => {
    // Composed subjects (demo-composed-suites.ts) show one story each on the paths it needs.
    for (const s of demoCatalogue()) {
      const straddles = s.paths.filter((p) => p.kind === 'straddle');
      if (s.branch.kind !== 'principal' || s.subject === 'exp(z)' || DEMO_COMPOSED_SUITES.includes(s)) continue;
      expect(straddles.length).toBeGreaterThan(0);
      const parsed = validateSuite(s, s.id);
      if (!parsed.ok) throw new Error('invalid');
      for (const p of parsed.suite.paths)
        if (p.kind === 'straddle') expect(p.offsets).toEqual(['1e-3', '1e-9', '1e-300', '5e-324']);
    }
  });

  it('keeps suites/suite.schema.json equal to the JSON Schema generated from the zod schema', () => {
    const committed = JSON.parse(readFileSync(path.join(DIR, '..', 'suite.schema.json'), 'utf8'));
    expect(committed).toEqual(suiteJsonSchema());
  });
});
