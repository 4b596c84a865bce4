import type { TargetIdentity } from './target-identity';

/** One target as `GET /api/targets` lists it: its identity (the harness's name, library, version, settings) and whether it is installed. */
export interface TargetView extends TargetIdentity {
  /** False once a server start no longer finds it installed. */
  installed: boolean;
}
