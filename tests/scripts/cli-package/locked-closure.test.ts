import { readFileSync } from 'node:fs';
import path from 'node:path';
import { lockedClosure } from '../../../scripts/cli-package/locked-closure';

describe('lockedClosure', () => {
  it('finds each package where Node would, innermost node_modules first, with non-optional peers and present optionals', () => {
    const lock = {
      packages: {
        'node_modules/a': { dependencies: { b: '^1', c: '^2' }, optionalDependencies: { gone: '1' } },
        'node_modules/a/node_modules/b': {
          peerDependencies: { p: '1', q: '1' },
          peerDependenciesMeta: { q: { optional: true } },
        },
        'node_modules/b': {},
        'node_modules/c': { dependencies: { b: '^2' } },
        'node_modules/p': {},
        'node_modules/q': {},
        'node_modules/unused': {},
      },
    };
    expect(lockedClosure(['a'], lock)).toEqual([
      'node_modules/a',
      'node_modules/a/node_modules/b',
      'node_modules/b',
      'node_modules/c',
      'node_modules/p',
    ]);
  });

  it('names a needed package the lock does not have', () => {
    expect(() => lockedClosure(['a'], { packages: { 'node_modules/a': { dependencies: { x: '1' } } } })).toThrow(
      'package-lock.json has no x for node_modules/a',
    );
  });

  it("gives the CLI package's dependencies at the versions the root installs", () => {
    const root = path.join(__dirname, '..', '..', '..');
    const read = (file: string) => JSON.parse(readFileSync(path.join(root, file), 'utf8'));
    const cli = read('packages/cli/package.json') as { dependencies: Record<string, string> };
    const lock = read('package-lock.json') as { packages: Record<string, { version: string }> };
    const closure = lockedClosure(Object.keys(cli.dependencies), lock);
    for (const [name, version] of Object.entries(cli.dependencies)) {
      expect(closure).toContain(`node_modules/${name}`);
      expect(lock.packages[`node_modules/${name}`]?.version).toBe(version);
    }
  });
});
