import type { TargetSource } from '../shared/target-source';

/** The add-a-target form as typed: every field text, whatever the kind. */
export interface TargetSourceDraft {
  kind: TargetSource['kind'];
  package: string;
  version: string;
  path: string;
  /** The program and its arguments separated by spaces (no shell quoting: an argument cannot hold a space). */
  command: string;
  cwd: string;
  name: string;
}

/**
 * The source the draft names, for shared/target-source.ts's schema to judge (the same schema the
 * server applies): only the fields of its kind, an empty optional field left out, text as typed
 * (the schema names what is wrong with it) except the command, split at spaces.
 */
export function targetSourceOfDraft(draft: TargetSourceDraft): unknown {
  const name = draft.name.trim() === '' ? {} : { name: draft.name.trim() };
  if (draft.kind === 'npm')
    return { kind: 'npm', package: draft.package.trim(), version: draft.version.trim(), ...name };
  if (draft.kind === 'local') return { kind: 'local', path: draft.path.trim(), ...name };
  return {
    kind: 'program',
    command: draft.command.trim().split(/\s+/).filter(Boolean),
    ...(draft.cwd.trim() === '' ? {} : { cwd: draft.cwd.trim() }),
    ...name,
  };
}
