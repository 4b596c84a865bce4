import type { DataSource } from 'typeorm';
import type { DecisionView } from '../../shared/decision-view';
import { Deviation } from '../entities/deviation';
import { deviationAppliesSql } from '../sql/deviation-applies-sql';
import { failureMatchSql } from '../sql/failure-match-sql';
import { toDecisionView } from '../views/to-decision-view';

/**
 * The decisions that apply to one failure by scope and version, newest first: in force and expired
 * (the case page says which), revoked ones left out. The same rule as the failure table's
 * `accepted` status and regressions (deviation-applies-sql.ts), without its state condition.
 */
export async function decisionsOn(dataSource: DataSource, failureId: string): Promise<DecisionView[]> {
  const ids: { id: string }[] = await dataSource.query(
    `SELECT d.id FROM failures f JOIN deviations d ON ${deviationAppliesSql('d', failureMatchSql('f'))}
      WHERE f.id = $1 AND d.revoked_at IS NULL`,
    [failureId],
  );
  if (ids.length === 0) return [];
  const found = await dataSource.getRepository(Deviation).find({
    where: ids.map(({ id }) => ({ id })),
    relations: { createdBy: true },
    order: { createdAt: 'DESC' },
  });
  return found.map(toDecisionView);
}
