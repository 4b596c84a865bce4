import type { TargetSource } from '../../shared/target-source';
import { TARGET_SOURCE_KIND_WORDS } from './target-source-kind-words';

/** A source in one line for the list: its kind and what it names. */
export function targetSourceWords(source: TargetSource): { kind: string; what: string } {
  const kind = TARGET_SOURCE_KIND_WORDS[source.kind];
  if (source.kind === 'npm') return { kind, what: `${source.package}@${source.version}` };
  if (source.kind === 'local') return { kind, what: source.path };
  return { kind, what: [...source.command, ...(source.cwd ? [`(in ${source.cwd})`] : [])].join(' ') };
}
