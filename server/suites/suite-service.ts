import type { DataSource, EntityManager } from 'typeorm';
import type { Suite as SuiteBody } from '../../shared/schemas/suite-schema';
import type { SuiteStatus } from '../../shared/suite-status';
import type { SuiteSummary } from '../../shared/suite-summary';
import type { SuiteVersionView } from '../../shared/suite-version-view';
import { Suite } from '../entities/suite';
import { SuiteVersion } from '../entities/suite-version';
import type { User } from '../entities/user';
import { HttpError } from '../http/http-error';
import { refuseBrokenBody } from './refuse-broken-body';
import { toSuiteVersionView } from '../views/to-suite-version-view';

const RELATIONS = { suite: true, author: true, takenOverFrom: true, reviewer: true } as const;

/**
 * Suites and their review. Every change runs in one transaction that locks the suite row,
 * so two people acting on the same suite at once are serialised and versions never collide.
 */
export class SuiteService {
  constructor(private readonly dataSource: DataSource) {}

  async list(filter: { status?: SuiteStatus; q?: string }): Promise<SuiteSummary[]> {
    const rows: {
      slug: string;
      title: string;
      subject: string;
      version: number;
      status: SuiteStatus;
      approved: number | null;
      author: string;
      updated: Date;
    }[] = await this.dataSource.query(
      `SELECT s.slug, v.body->>'title' AS title, v.body->>'subject' AS subject, v.version, v.status,
                (SELECT max(a.version) FROM suite_versions a WHERE a.suite_id = s.id AND a.status = 'approved') AS approved,
                u.display_name AS author, greatest(v.created_at, v.submitted_at, v.reviewed_at) AS updated
           FROM suites s
           JOIN LATERAL (SELECT * FROM suite_versions x WHERE x.suite_id = s.id ORDER BY x.version DESC LIMIT 1) v ON true
           JOIN users u ON u.id = v.author_id
          WHERE ($1::text IS NULL OR v.status = $1)
            AND ($2::text IS NULL OR s.slug ILIKE '%' || $2 || '%' OR v.body->>'title' ILIKE '%' || $2 || '%' OR v.body->>'subject' ILIKE '%' || $2 || '%')
          ORDER BY updated DESC, s.slug`,
      [filter.status ?? null, filter.q ? filter.q.replace(/[\\%_]/g, (c) => `\\${c}`) : null],
    );
    return rows.map((r) => ({
      slug: r.slug,
      title: r.title,
      subject: r.subject,
      latestVersion: r.version,
      latestStatus: r.status,
      approvedVersion: r.approved,
      authorName: r.author,
      updatedAt: new Date(r.updated).toISOString(),
    }));
  }

  async versions(slug: string): Promise<SuiteVersionView[]> {
    const versions = await this.dataSource
      .getRepository(SuiteVersion)
      .find({ where: { suite: { slug } }, relations: RELATIONS, order: { version: 'DESC' } });
    if (versions.length === 0) throw notFound(slug);
    return versions.map(toSuiteVersionView);
  }

  /**
   * Saves a suite from a form or a file. `mode: 'create'` refuses an existing slug; `'edit'`
   * refuses a missing one; `'upsert'` (uploads) does either. An edit changes the latest draft in
   * place, or starts a new draft version after an approved or retired one.
   */
  async save(
    user: User,
    body: SuiteBody,
    mode: 'create' | 'edit' | 'upsert',
  ): Promise<{ created: boolean; view: SuiteVersionView }> {
    // Two first saves of one new slug at once both find no row to lock; the unique index stops the second.
    return this.saveLocked(user, body, mode).catch((e: unknown) => {
      if ((e as { driverError?: { code?: string } }).driverError?.code === '23505')
        throw new HttpError(409, {
          kind: 'conflict',
          message: `A suite with the id "${body.id}" was just created by someone else.`,
        });
      throw e;
    });
  }

  private async saveLocked(
    user: User,
    body: SuiteBody,
    mode: 'create' | 'edit' | 'upsert',
  ): Promise<{ created: boolean; view: SuiteVersionView }> {
    return this.dataSource.transaction(async (tx) => {
      const suite = await lockSuite(tx, body.id);
      if (!suite) {
        if (mode === 'edit') throw notFound(body.id);
        const created = await tx
          .getRepository(Suite)
          .save(tx.getRepository(Suite).create({ slug: body.id, createdBy: user }));
        const version = await tx.getRepository(SuiteVersion).save(
          tx.getRepository(SuiteVersion).create({
            suite: created,
            version: 1,
            status: 'draft',
            body: { ...body, version: 1 },
            author: user,
            takenOverFrom: null,
            reviewer: null,
            reviewComment: null,
            submittedAt: null,
            reviewedAt: null,
          }),
        );
        return { created: true, view: await this.view(tx, version.id) };
      }
      if (mode === 'create')
        throw new HttpError(409, {
          kind: 'conflict',
          message: `A suite with the id "${body.id}" exists already: edit it instead.`,
        });
      const latest = await latestVersion(tx, suite.id);
      if (latest.status === 'submitted')
        throw new HttpError(409, {
          kind: 'conflict',
          message: `Version ${latest.version} is waiting for review; it can be edited once reviewed.`,
        });
      if (latest.status === 'draft' || latest.status === 'changes-requested') {
        if (latest.author.id !== user.id && user.role !== 'admin')
          throw new HttpError(403, {
            kind: 'forbidden',
            message: `Version ${latest.version} is ${latest.author.displayName}'s draft.`,
          });
        // The last editor is the author: an admin who edits Ravi's draft answers for its words and
        // cannot approve them; the draft records whose it was.
        const takenOver = latest.author.id !== user.id;
        await tx.getRepository(SuiteVersion).update(latest.id, {
          body: { ...body, version: latest.version },
          status: 'draft',
          author: user,
          ...(takenOver ? { takenOverFrom: latest.author } : {}),
        });
        return { created: false, view: await this.view(tx, latest.id) };
      }
      const next = await tx.getRepository(SuiteVersion).save(
        tx.getRepository(SuiteVersion).create({
          suite,
          version: latest.version + 1,
          status: 'draft',
          body: { ...body, version: latest.version + 1 },
          author: user,
          takenOverFrom: null,
          reviewer: null,
          reviewComment: null,
          submittedAt: null,
          reviewedAt: null,
        }),
      );
      return { created: true, view: await this.view(tx, next.id) };
    });
  }

  async submit(user: User, slug: string): Promise<SuiteVersionView> {
    return this.dataSource.transaction(async (tx) => {
      const suite = await lockSuite(tx, slug);
      if (!suite) throw notFound(slug);
      const latest = await latestVersion(tx, suite.id);
      if (latest.status !== 'draft' && latest.status !== 'changes-requested')
        throw new HttpError(409, {
          kind: 'conflict',
          message: `Version ${latest.version} is ${latest.status}; only a draft can be submitted.`,
        });
      if (latest.author.id !== user.id && user.role !== 'admin')
        throw new HttpError(403, {
          kind: 'forbidden',
          message: 'Only the author (or an admin) can submit this draft.',
        });
      refuseBrokenBody(latest.body, latest.version, 'submitted');
      await tx.getRepository(SuiteVersion).update(latest.id, { status: 'submitted', submittedAt: new Date() });
      return this.view(tx, latest.id);
    });
  }

  async review(
    user: User,
    slug: string,
    version: number,
    decision: 'approve' | 'request-changes',
    comment: string,
  ): Promise<SuiteVersionView> {
    return this.dataSource.transaction(async (tx) => {
      const target = await this.lockedVersion(tx, slug, version);
      if (target.status !== 'submitted')
        throw new HttpError(409, {
          kind: 'conflict',
          message: `Version ${version} is ${target.status}; only a submitted version can be reviewed.`,
        });
      // Four eyes: nobody reviews words they wrote, whatever their role: neither the last editor
      // (the author) nor the person whose draft that editor took over.
      if (target.author.id === user.id || target.takenOverFrom?.id === user.id)
        throw new HttpError(403, { kind: 'forbidden', message: 'You cannot review a suite version you wrote.' });
      // A version stored before a rule of the suite format existed (a circle of radius -1) is
      // checked again: approving it would put a suite that checks nothing into every plan run.
      if (decision === 'approve') refuseBrokenBody(target.body, version, 'approved');
      await tx.getRepository(SuiteVersion).update(target.id, {
        status: decision === 'approve' ? 'approved' : 'changes-requested',
        reviewer: user,
        reviewComment: comment || null,
        reviewedAt: new Date(),
      });
      return this.view(tx, target.id);
    });
  }

  async retire(slug: string, version: number): Promise<SuiteVersionView> {
    return this.dataSource.transaction(async (tx) => {
      const target = await this.lockedVersion(tx, slug, version);
      if (target.status !== 'approved')
        throw new HttpError(409, {
          kind: 'conflict',
          message: `Version ${version} is ${target.status}; only an approved version can be retired.`,
        });
      await tx.getRepository(SuiteVersion).update(target.id, { status: 'retired' });
      return this.view(tx, target.id);
    });
  }

  private async lockedVersion(tx: EntityManager, slug: string, version: number): Promise<SuiteVersion> {
    const suite = await lockSuite(tx, slug);
    if (!suite) throw notFound(slug);
    const found = await tx
      .getRepository(SuiteVersion)
      .findOne({ where: { suite: { id: suite.id }, version }, relations: RELATIONS });
    if (!found) throw new HttpError(404, { kind: 'not-found', message: `Suite "${slug}" has no version ${version}.` });
    return found;
  }

  private async view(tx: EntityManager, id: string): Promise<SuiteVersionView> {
    return toSuiteVersionView(
      await tx.getRepository(SuiteVersion).findOneOrFail({ where: { id }, relations: RELATIONS }),
    );
  }
}

function notFound(slug: string): HttpError {
  return new HttpError(404, { kind: 'not-found', message: `No suite with the id "${slug}".` });
}

async function lockSuite(tx: EntityManager, slug: string): Promise<Suite | null> {
  return tx.getRepository(Suite).findOne({ where: { slug }, lock: { mode: 'pessimistic_write' } });
}

async function latestVersion(tx: EntityManager, suiteId: string): Promise<SuiteVersion> {
  return tx
    .getRepository(SuiteVersion)
    .findOneOrFail({ where: { suite: { id: suiteId } }, relations: { author: true }, order: { version: 'DESC' } });
}
