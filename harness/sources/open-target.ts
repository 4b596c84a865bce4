import { complexJsTarget } from '../adapters/complex-js-target';
import { mathjsTarget } from '../adapters/mathjs-target';
import { programTarget } from '../adapters/program-target';
import type { Target } from '../adapters/target';
import type { ConfiguredTargetSpec } from './configured-target-spec';

/**
 * Opens a configured target from its spec; nothing is loaded or started until first use. Named
 * `openTarget` because a slice worker thread (slice-worker.ts) requires this module by path and
 * calls that export with the descriptor's `worker.args`.
 */
export function openTarget(spec: ConfiguredTargetSpec): Target {
  if (spec.kind === 'complex.js')
    return complexJsTarget(spec.folder, spec.version, { name: spec.name, settings: spec.settings });
  if (spec.kind === 'mathjs')
    return mathjsTarget(spec.folder, spec.version, spec.entry, spec.predictable, spec.complexJs, {
      base: spec.base,
      settings: spec.settings,
    });
  return programTarget(spec.source, spec.baseDir, spec.identity);
}
