import path from 'node:path';
import { commandTargets } from '../../../harness/command-support/command-targets';
import { libraryVersions } from '../../../harness/matrix/library-versions';

describe('libraryVersions', () => {
  it('lists every installed complex.js oldest first, 2.0.11 to 2.4.3', () => {
    const versions = libraryVersions('complex.js').map((d) => d.version);
    expect(versions[0]).toBe('2.0.11');
    expect(versions[versions.length - 1]).toBe('2.4.3');
    expect(versions).toEqual(expect.arrayContaining(['2.1.1', '2.2.5', '2.3.0', '2.4.1', '2.4.2']));
  });

  it('keeps the settings apart: mathjs/complex has one target per version, all with the complex entry point', () => {
    const found = libraryVersions('mathjs/complex');
    expect(found.map((d) => d.version)).toEqual(['13.2.3', '14.9.1', '15.2.0']);
    expect(found.every((d) => d.settings.entry === 'complex' && d.settings.predictable === false)).toBe(true);
  });

  it('finds nothing for a name with its version or an unknown library', () => {
    expect(libraryVersions('complex.js@2.4.3')).toEqual([]);
    // NumPy is a target since the stdio NumPy adapter, so the unknown library is one nobody adapts.
    expect(libraryVersions('no-such-library')).toEqual([]);
  });

  it('puts a configured copy among the installed versions, after the release of its own version', async () => {
    const { known } = await commandTargets([
      '--local',
      path.join(__dirname, '..', '..', '..', 'node_modules', 'complex.js-2.3.0'),
    ]);
    expect(libraryVersions('complex.js', known).map((d) => d.name)).toEqual([
      'complex.js@2.0.11',
      'complex.js@2.1.1',
      'complex.js@2.2.5',
      'complex.js@2.3.0',
      'complex.js@2.3.0+local',
      'complex.js@2.4.1',
      'complex.js@2.4.2',
      'complex.js@2.4.3',
    ]);
  });
});
