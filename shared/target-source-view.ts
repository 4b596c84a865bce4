import type { TargetSource } from './target-source';
import type { TargetSourceState } from './target-source-states';

/** One admin-added target source as `GET /api/target-sources` lists it. */
export interface TargetSourceView {
  id: string;
  /** As the admin gave it (shared/target-source.ts). */
  source: TargetSource;
  state: TargetSourceState;
  /** The targets it resolved to; empty until it is ready. */
  targetNames: string[];
  /** Why resolving it failed, in the resolver's words; null unless failed. */
  error: string | null;
  /** The admin's display name; null if that user is gone. */
  addedBy: string | null;
  addedAt: string;
  /** When it became ready or failed. */
  resolvedAt: string | null;
}
