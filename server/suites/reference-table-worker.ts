import { checkReferenceTable } from '../../harness';
import { serveThreadRequests } from '../workers/serve-thread-requests';
import type { ReferenceTableRequest } from './reference-table-request';

/** The body of a reference-table thread (reference-table-checks.ts): the check itself, off the server's thread. */
serveThreadRequests<ReferenceTableRequest>(({ suite, csv }) => checkReferenceTable(suite, csv));
