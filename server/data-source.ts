import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { AccountLink } from './entities/account-link';
import { ApiToken } from './entities/api-token';
import { Deviation } from './entities/deviation';
import { Failure } from './entities/failure';
import { OutboxMail } from './entities/outbox-mail';
import { PathSummary } from './entities/path-summary';
import { Plan } from './entities/plan';
import { PropertyResult } from './entities/property-result';
import { RegressionGroup } from './entities/regression-group';
import { Schedule } from './entities/schedule';
import { ScheduleFiring } from './entities/schedule-firing';
import { Shard } from './entities/shard';
import { Subscription } from './entities/subscription';
import { TargetRow } from './entities/target-row';
import { TargetSourceRow } from './entities/target-source-row';
import { Upload } from './entities/upload';
import { ReceivedMail } from './entities/received-mail';
import { Run } from './entities/run';
import { Suite } from './entities/suite';
import { SuiteVersion } from './entities/suite-version';
import { User } from './entities/user';
import { WorkerRow } from './entities/worker-row';
import { DATABASE_CONNECT_TIMEOUT_MS } from './database/database-connect-timeout-ms';
import { logPoolError } from './database/log-pool-error';
import { RedactingQueryLogger } from './database/redacting-query-logger';
import { SuiteVersionTakenOverFrom1764887400000 } from './migrations/1764887400000-suite-version-taken-over-from';
import { FailureLabelsAndClasses1764900000000 } from './migrations/1764900000000-failure-labels-and-classes';
import { TargetSources1764910000000 } from './migrations/1764910000000-target-sources';
import { UsersSessionsSignInLimits1764626400000 } from './migrations/1764626400000-users-sessions-sign-in-limits';
import { SuitesAndVersions1764700000000 } from './migrations/1764700000000-suites-and-versions';
import { MailOutboxAndReceivedMail1764710000000 } from './migrations/1764710000000-mail-outbox-and-received-mail';
import { TargetsPlansSchedules1764720000000 } from './migrations/1764720000000-targets-plans-schedules';
import { RunsShardsFailures1764730000000 } from './migrations/1764730000000-runs-shards-failures';
import { Deviations1764740000000 } from './migrations/1764740000000-deviations';
import { ApiTokens1764750000000 } from './migrations/1764750000000-api-tokens';
import { Subscriptions1764760000000 } from './migrations/1764760000000-subscriptions';
import { Uploads1764770000000 } from './migrations/1764770000000-uploads';
import { FailureTableIndexes1764780000000 } from './migrations/1764780000000-failure-table-indexes';
import { PropertyResults1764790000000 } from './migrations/1764790000000-property-results';
import { RegressionGroups1764811100000 } from './migrations/1764811100000-regression-groups';
import { FailureTableRowType1764800000000 } from './migrations/1764800000000-failure-table-row-type';
import { OneActiveRunHeartbeatsMailOnce1764810000000 } from './migrations/1764810000000-one-active-run-heartbeats-mail-once';
import { Workers1764920000000 } from './migrations/1764920000000-workers';
import { DecisionVersions1764930000000 } from './migrations/1764930000000-decision-versions';
import { AccountLinksAndDeactivation1764940000000 } from './migrations/1764940000000-account-links-and-deactivation';
import { NewestFailuresFirstAndFirstRuns1764960000000 } from './migrations/1764960000000-newest-failures-first-and-first-runs';
import { UlpsTiesNewestFirst1764970000000 } from './migrations/1764970000000-ulps-ties-newest-first';
import { ChecksStoppedByError1764980000000 } from './migrations/1764980000000-checks-stopped-by-error';
import { ChecksFailed1765000000000 } from './migrations/1765000000000-checks-failed';
import { InvitationCancelledAt1764990000000 } from './migrations/1764990000000-invitation-cancelled-at';

/** Entities and migrations are listed, not globbed, so tsx, jest and tsc builds all find them. */
export const ENTITIES = [
  User,
  Suite,
  SuiteVersion,
  OutboxMail,
  ReceivedMail,
  TargetRow,
  Plan,
  Schedule,
  ScheduleFiring,
  Run,
  Shard,
  Failure,
  PathSummary,
  Deviation,
  ApiToken,
  Subscription,
  Upload,
  PropertyResult,
  RegressionGroup,
  TargetSourceRow,
  WorkerRow,
  AccountLink,
];
export const MIGRATIONS = [
  UsersSessionsSignInLimits1764626400000,
  SuitesAndVersions1764700000000,
  MailOutboxAndReceivedMail1764710000000,
  TargetsPlansSchedules1764720000000,
  RunsShardsFailures1764730000000,
  Deviations1764740000000,
  ApiTokens1764750000000,
  Subscriptions1764760000000,
  Uploads1764770000000,
  FailureTableIndexes1764780000000,
  PropertyResults1764790000000,
  FailureTableRowType1764800000000,
  OneActiveRunHeartbeatsMailOnce1764810000000,
  RegressionGroups1764811100000,
  SuiteVersionTakenOverFrom1764887400000,
  FailureLabelsAndClasses1764900000000,
  TargetSources1764910000000,
  Workers1764920000000,
  DecisionVersions1764930000000,
  AccountLinksAndDeactivation1764940000000,
  NewestFailuresFirstAndFirstRuns1764960000000,
  UlpsTiesNewestFirst1764970000000,
  ChecksStoppedByError1764980000000,
  InvitationCancelledAt1764990000000,
  ChecksFailed1765000000000,
];

export function createDataSource(url: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    synchronize: false,
    // Failed queries are logged without their parameters (token hashes, bodies): see the logger.
    logger: new RedactingQueryLogger(),
    poolErrorHandler: logPoolError,
    connectTimeoutMS: DATABASE_CONNECT_TIMEOUT_MS,
    extra: { max: 10 },
  });
}
