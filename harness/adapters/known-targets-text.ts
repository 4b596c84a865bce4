import type { TargetDescriptor } from './target-descriptor';

/** The names an unknown-target error lists: the installed ones, then the configured ones with where each comes from. */
export function knownTargetsText(targets: readonly TargetDescriptor[]): string {
  const installed = targets.filter((t) => t.from === undefined).map((t) => t.name);
  const configured = targets.filter((t) => t.from !== undefined).map((t) => `${t.name} (${t.from})`);
  return `installed: ${installed.join(', ') || 'none'}${configured.length > 0 ? `; configured: ${configured.join(', ')}` : ''}`;
}
