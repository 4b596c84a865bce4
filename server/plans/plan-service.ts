import { In, type DataSource, type EntityManager } from 'typeorm';
import type { PlanView } from '../../shared/plan-view';
import type { PlanBody } from '../../shared/schemas/plan-body';
import { Plan } from '../entities/plan';
import { Suite } from '../entities/suite';
import { TargetRow } from '../entities/target-row';
import type { User } from '../entities/user';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';

/** Plans: suites × targets and recipients. Only suites with an approved version may join. */
export class PlanService {
  constructor(private readonly dataSource: DataSource) {}

  async list(): Promise<PlanView[]> {
    const plans = await this.dataSource.getRepository(Plan).find({ order: { name: 'ASC' } });
    return Promise.all(plans.map((p) => this.view(this.dataSource.manager, p.id)));
  }

  async get(id: string): Promise<PlanView> {
    return this.view(this.dataSource.manager, id);
  }

  async save(user: User, body: PlanBody, id: string | null): Promise<PlanView> {
    return this.dataSource
      .transaction(async (tx) => {
        const plans = tx.getRepository(Plan);
        const plan = id
          ? await plans.findOne({ where: { id }, lock: { mode: 'pessimistic_write' } })
          : plans.create({ createdBy: user });
        if (!plan) throw notFound();
        plan.name = body.name;
        plan.description = body.description;
        plan.recipients = body.recipients;
        plan.suites = await this.approvedSuites(tx, body.suites);
        plan.targets = await this.knownTargets(tx, body.targets);
        const saved = await plans.save(plan);
        return this.view(tx, saved.id);
      })
      .catch((e: unknown) => {
        if ((e as { driverError?: { code?: string } }).driverError?.code === '23505')
          throw new InputError([{ field: 'body.name', rule: 'is taken by another plan' }]);
        throw e;
      });
  }

  async remove(id: string): Promise<void> {
    const result = await this.dataSource.getRepository(Plan).delete({ id });
    if (!result.affected) throw notFound();
  }

  private async approvedSuites(tx: EntityManager, slugs: string[]): Promise<Suite[]> {
    const rows: { id: string; slug: string; approved: number | null }[] = await tx.query(
      `SELECT s.id, s.slug, (SELECT max(version) FROM suite_versions v WHERE v.suite_id = s.id AND v.status = 'approved') AS approved FROM suites s WHERE s.slug = ANY($1)`,
      [slugs],
    );
    const bySlug = new Map(rows.map((r) => [r.slug, r]));
    const issues = slugs.flatMap((slug, i) => {
      const row = bySlug.get(slug);
      if (!row) return [{ field: `body.suites.${i}`, rule: `names no suite ("${slug}")` }];
      if (row.approved === null)
        return [{ field: `body.suites.${i}`, rule: `has no approved version yet ("${slug}")` }];
      return [];
    });
    if (issues.length > 0) throw new InputError(issues);
    return tx.getRepository(Suite).findBy({ slug: In(slugs) });
  }

  private async knownTargets(tx: EntityManager, names: string[]): Promise<TargetRow[]> {
    const found = await tx.getRepository(TargetRow).findBy({ name: In(names) });
    const known = new Map(found.map((t) => [t.name, t]));
    const issues = names.flatMap((name, i) => {
      const target = known.get(name);
      if (!target) return [{ field: `body.targets.${i}`, rule: `names no known target ("${name}")` }];
      if (!target.installed)
        return [{ field: `body.targets.${i}`, rule: `is not installed on this server ("${name}")` }];
      return [];
    });
    if (issues.length > 0) throw new InputError(issues);
    return found;
  }

  private async view(tx: EntityManager, id: string): Promise<PlanView> {
    const plan = await tx
      .getRepository(Plan)
      .findOne({ where: { id }, relations: { suites: true, targets: true, createdBy: true } });
    if (!plan) throw notFound();
    const suiteRows: { slug: string; title: string | null; approved: number | null }[] = plan.suites.length
      ? await tx.query(
          `SELECT s.slug,
                  (SELECT v.body->>'title' FROM suite_versions v WHERE v.suite_id = s.id ORDER BY (v.status = 'approved') DESC, v.version DESC LIMIT 1) AS title,
                  (SELECT max(version) FROM suite_versions v WHERE v.suite_id = s.id AND v.status = 'approved') AS approved
             FROM suites s WHERE s.id = ANY($1) ORDER BY s.slug`,
          [plan.suites.map((s) => s.id)],
        )
      : [];
    return {
      id: plan.id,
      name: plan.name,
      description: plan.description,
      recipients: plan.recipients,
      suites: suiteRows.map((r) => ({ slug: r.slug, title: r.title ?? r.slug, approvedVersion: r.approved })),
      targets: plan.targets
        .map((t) => ({ name: t.name, installed: t.installed }))
        .sort((a, b) => a.name.localeCompare(b.name)),
      createdBy: plan.createdBy.displayName,
      updatedAt: plan.updatedAt.toISOString(),
    };
  }
}

function notFound(): HttpError {
  return new HttpError(404, { kind: 'not-found', message: 'No plan with that id.' });
}
