import type { TargetSource } from '../../shared/target-source';

/** The form's and the list's words for each kind of source, declared once. */
export const TARGET_SOURCE_KIND_WORDS: Record<TargetSource['kind'], string> = {
  npm: 'npm package',
  local: 'Folder or tarball on the server',
  program: 'Program (any language)',
};
