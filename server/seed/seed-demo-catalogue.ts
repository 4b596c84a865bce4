import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { validateSuite } from '../../shared/validate-suite';
import { Plan } from '../entities/plan';
import { Schedule } from '../entities/schedule';
import { Suite } from '../entities/suite';
import { TargetRow } from '../entities/target-row';
import { User } from '../entities/user';
import { PlanService } from '../plans/plan-service';
import { SuiteService } from '../suites/suite-service';
import { DEMO_PLANS } from './demo-plans';

const DEMO_DIR = path.join(__dirname, '..', '..', 'suites', 'demo');

/**
 * The demo catalogue as approved suites (written by the demo contributor, approved by the demo
 * reviewer) and the demo plans with their schedules. Adds only what is missing, so a second
 * `npm start` changes nothing and edits made in the app survive. Needs the demo users and
 * the installed targets first. Returns what it added.
 */
export async function seedDemoCatalogue(dataSource: DataSource): Promise<{ suites: number; plans: number }> {
  const users = dataSource.getRepository(User);
  const author = await users.findOneByOrFail({ email: 'ravi@sheetkeeper.test' });
  const reviewer = await users.findOneByOrFail({ email: 'hanne@sheetkeeper.test' });
  const maintainer = await users.findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
  const suites = new SuiteService(dataSource);
  let addedSuites = 0;
  const ids: string[] = [];
  for (const file of readdirSync(DEMO_DIR)
    .filter((f) => f.endsWith('.json'))
    .sort()) {
    const checked = validateSuite(JSON.parse(readFileSync(path.join(DEMO_DIR, file), 'utf8')), file);
    if (!checked.ok)
      throw new Error(`demo suite ${file} is invalid: ${checked.issues.map((i) => `${i.field} ${i.rule}`).join('; ')}`);
    ids.push(checked.suite.id);
    if (await dataSource.getRepository(Suite).existsBy({ slug: checked.suite.id })) continue;
    await suites.save(author, checked.suite, 'create');
    await suites.submit(author, checked.suite.id);
    await suites.review(reviewer, checked.suite.id, 1, 'approve', 'Demo catalogue: approved at seeding.');
    addedSuites += 1;
  }
  const installed = (await dataSource.getRepository(TargetRow).findBy({ installed: true })).map((t) => t.name);
  const plans = new PlanService(dataSource);
  let addedPlans = 0;
  for (const demo of DEMO_PLANS) {
    if (await dataSource.getRepository(Plan).existsBy({ name: demo.name })) continue;
    const targets = demo.targets(installed);
    if (targets.length === 0) continue;
    const view = await plans.save(
      maintainer,
      {
        name: demo.name,
        description: demo.description,
        recipients: demo.recipients,
        suites: ids.filter(demo.suites),
        targets,
      },
      null,
    );
    await dataSource.getRepository(Schedule).save({
      plan: { id: view.id },
      cron: demo.schedule.cron,
      timeZone: demo.schedule.timeZone,
      enabled: true,
      createdBy: maintainer,
    });
    addedPlans += 1;
  }
  return { suites: addedSuites, plans: addedPlans };
}
