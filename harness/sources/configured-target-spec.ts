import type { ProgramTargetSource } from '../../shared/target-source';
import type { ProgramIdentity } from '../adapters/program-target';
import type { Target } from '../adapters/target';

/**
 * Everything needed to open one configured target again, as plain JSON: what a worker thread
 * receives (TargetDescriptor.worker's `args`) so it opens the same target without installing,
 * unpacking or describing anything again. `folder` is a package folder's absolute path.
 */
export type ConfiguredTargetSpec =
  | { kind: 'complex.js'; folder: string; version: string; name: string; settings: Target['settings'] }
  | {
      kind: 'mathjs';
      folder: string;
      version: string;
      /** The name before the entry: "mathjs@15.2.0" or the source's `name`. */
      base: string;
      settings: Target['settings'];
      entry: 'complex' | 'number';
      predictable: boolean;
      complexJs: string;
    }
  | { kind: 'program'; source: ProgramTargetSource; baseDir: string; identity: ProgramIdentity };
