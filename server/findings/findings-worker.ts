import {
  FINGERPRINT_FUNCTIONS,
  findEntry,
  fingerprintTarget,
  libraryVersions,
  mapCuts,
  type Target,
  type TargetDescriptor,
  versionMatrix,
} from '../../harness';
import type { FindingsRequest } from './findings-messages';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import { openInstalledTarget } from '../targets/open-installed-target';
import { AddedTargetDescriptors } from '../targets/added-target-descriptors';
import { targetSourceOptions } from '../targets/target-source-options';
import type { TargetSource } from '../../shared/target-source';
import { serveThreadRequests } from '../workers/serve-thread-requests';

/**
 * The body of a findings thread (findings-pool.ts): runs the library code behind the
 * fingerprint, cut map and version matrix, one request at a time per thread, so loading mathjs
 * (~1.1 s a version) or a 201×201 cut map (up to ~0.7 s) never holds up the server's own thread.
 */
const versionsByLibrary = new Map<string, TargetDescriptor[]>();
/** Admin-added targets, resolved in this thread on first use (npm versions into the server's default cache). */
const added = new AddedTargetDescriptors(targetSourceOptions());

const fn = (label: string) => {
  const found = FINGERPRINT_FUNCTIONS.find((f) => f.label === label);
  if (!found)
    throw new InputError([{ field: 'query.fn', rule: `is not a function the fingerprint knows ("${label}")` }]);
  return found;
};

/** Opens the target for one computation and always closes it: cmath is a Python child process. */
async function withTarget<T>(
  name: string,
  source: { id: string; source: TargetSource } | undefined,
  work: (target: Target) => Promise<T>,
): Promise<T> {
  const target = openInstalledTarget(name) ?? (source ? await added.open(source.id, source.source, name) : null);
  if (!target) throw new HttpError(404, { kind: 'not-found', message: `No installed target "${name}".` });
  try {
    return await work(target);
  } finally {
    await target.close();
  }
}

async function compute(request: FindingsRequest): Promise<unknown> {
  switch (request.kind) {
    case 'fingerprint':
      return withTarget(request.target, request.added, (target) => {
        const entry = findEntry(target, request.entry);
        if (entry instanceof Error) throw new InputError([{ field: 'query.entry', rule: entry.message }]);
        return fingerprintTarget(target, request.functions.map(fn), entry.name);
      });
    case 'cut-map': {
      const f = fn(request.fn);
      const [re0, im0, re1, im1] = request.box;
      return withTarget(request.target, request.added, async (target) => {
        if (!(await target.supports(f.op)))
          throw new InputError([{ field: 'query.fn', rule: `is not a function ${target.name} has (no ${f.op})` }]);
        return mapCuts(target, f, [re0, im0], [re1, im1], request.grid[0], request.grid[1]);
      });
    }
    case 'version-matrix': {
      let targets = versionsByLibrary.get(request.library);
      if (!targets) versionsByLibrary.set(request.library, (targets = libraryVersions(request.library)));
      for (const name of request.entries ?? []) {
        const lacking = targets.map((t) => findEntry(t, name)).find((e) => e instanceof Error);
        if (lacking) throw new InputError([{ field: 'query.entry', rule: lacking.message }]);
      }
      return versionMatrix(request.library, request.suites, targets, request.entries);
    }
  }
}

serveThreadRequests<FindingsRequest>(compute);
