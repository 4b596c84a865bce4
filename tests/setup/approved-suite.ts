import type { DataSource } from 'typeorm';
import { User } from '../../server/entities/user';
import { SuiteService } from '../../server/suites/suite-service';
import { validateSuite } from '../../shared/validate-suite';
import { demoSuiteBody } from './demo-suite-body';

/** Creates `slug` from a demo suite, written by Ravi and approved by Hanne, as a plan needs it. */
export async function approvedSuite(dataSource: DataSource, slug: string, demoId = 'sqrt-principal-sz'): Promise<void> {
  const users = dataSource.getRepository(User);
  const ravi = await users.findOneByOrFail({ email: 'ravi@sheetkeeper.test' });
  const hanne = await users.findOneByOrFail({ email: 'hanne@sheetkeeper.test' });
  const checked = validateSuite(demoSuiteBody(slug, demoId), slug);
  if (!checked.ok) throw new Error(`demo suite ${demoId} is invalid`);
  const service = new SuiteService(dataSource);
  await service.save(ravi, checked.suite, 'create');
  await service.submit(ravi, slug);
  await service.review(hanne, slug, 1, 'approve', '');
}
