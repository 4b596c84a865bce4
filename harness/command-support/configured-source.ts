import type { TargetSource } from '../../shared/target-source';

/** A target source as a command received it: the source, where it was named, the folder its relative paths start from. */
export interface ConfiguredSource {
  source: TargetSource;
  /** For people: `sheetkeeper.config.json targets[0]`, `--npm complex.js@2.5.0`. */
  from: string;
  baseDir: string;
  /** True when a flag named it (`--npm`, `--local`, `--program`), not the project file. */
  byFlag: boolean;
}
