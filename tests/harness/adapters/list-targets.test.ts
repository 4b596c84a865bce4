import path from 'node:path';
import { listTargets } from '../../../harness/adapters/list-targets';
import { commandTargets } from '../../../harness/command-support/command-targets';

const COMPLEX_JS_2_3_0 = path.join(__dirname, '..', '..', '..', 'node_modules', 'complex.js-2.3.0');

describe('listTargets', () => {
  it('lists the installed targets without `from` and the configured ones after them with where they were named', async () => {
    const { known } = await commandTargets(['--local', COMPLEX_JS_2_3_0]);
    const listed = listTargets(known);
    expect(listed.find((t) => t.name === 'complex.js@2.3.0')).not.toHaveProperty('from');
    expect(listed.at(-1)).toEqual({
      name: 'complex.js@2.3.0+local',
      library: 'complex.js',
      version: '2.3.0',
      settings: { source: 'local', path: COMPLEX_JS_2_3_0 },
      entries: expect.any(Array),
      from: `--local ${COMPLEX_JS_2_3_0}`,
    });
    expect(listTargets()).toEqual(listed.slice(0, -1));
  });
});
