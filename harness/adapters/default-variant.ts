import type { TargetDescriptor } from './target-descriptor';

/**
 * The one target a name without its variant means: the only candidate, or for mathjs the default
 * variant (complex entry point, predictable off). Undefined when that does not pick one.
 */
export function defaultVariant(candidates: readonly TargetDescriptor[]): TargetDescriptor | undefined {
  return candidates.length === 1
    ? candidates[0]
    : candidates.find((t) => t.settings.entry === 'complex' && t.settings.predictable === false);
}
