import { availableTargets } from '../../../server/targets/available-targets';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';
import { readyTargetSource } from '../../setup/ready-target-source';

describe('availableTargets', () => {
  let db: TestDatabase;
  let names: string[];

  beforeAll(async () => {
    db = await createTestDatabase();
    await readyTargetSource(db.dataSource, { kind: 'npm', package: 'complex.js', version: '2.3.0' }, 'npm-here@2.3.0');
    await readyTargetSource(db.dataSource, { kind: 'program', command: ['python3', '-V'] }, 'on-path@1');
    await readyTargetSource(db.dataSource, { kind: 'program', command: ['/nonexistent/adapter'] }, 'elsewhere@1');
    await readyTargetSource(db.dataSource, { kind: 'local', path: '/nonexistent/checkout' }, 'other-machine@1');
    await db.dataSource.query(
      `INSERT INTO target_sources (source, state) VALUES ('{"kind":"program","command":["python3"],"name":"pending@1"}', 'resolving')`,
    );
    names = (await availableTargets(db.dataSource)).map((t) => t.name);
  });
  afterAll(() => db.drop());

  it('adds the ready added targets this machine can run to the installed ones', () => {
    expect(names).toEqual(expect.arrayContaining(['complex.js@2.4.3', 'npm-here@2.3.0', 'on-path@1']));
  });

  it('leaves out a program or a path missing here, and a source still resolving', () => {
    expect(names).not.toEqual(expect.arrayContaining(['elsewhere@1']));
    expect(names).not.toContain('other-machine@1');
    expect(names).not.toContain('pending@1');
  });
});
