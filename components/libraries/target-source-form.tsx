import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { serverFieldErrors } from '../../client/server-field-errors';
import { targetSourceOfDraft, type TargetSourceDraft } from '../../client/target-source-of-draft';
import { useAddTargetSource } from '../../client/use-add-target-source';
import { theme } from '../../constants/theme';
import { fieldIssues } from '../../shared/field-issues';
import { targetSource, type TargetSource } from '../../shared/target-source';
import { ActionButton } from '../ui/action-button';
import { ChipGroup } from '../ui/chip-group';
import { FailureAlert } from '../ui/failure-alert';
import { SkText } from '../ui/sk-text';
import { TextField } from '../ui/text-field';
import { TARGET_SOURCE_KIND_WORDS } from './target-source-kind-words';

const EMPTY: TargetSourceDraft = { kind: 'npm', package: '', version: '', path: '', command: '', cwd: '', name: '' };
type Field = Exclude<keyof TargetSourceDraft, 'kind'>;

const KINDS = (Object.keys(TARGET_SOURCE_KIND_WORDS) as TargetSource['kind'][]).map((value) => ({
  value,
  text: TARGET_SOURCE_KIND_WORDS[value],
}));

/** What each kind means for whoever adds it, said once beside the fields. */
const KIND_NOTES: Record<TargetSource['kind'], string> = {
  npm: 'Installed from the npm registry into each worker’s own cache the first time a run needs it. complex.js and mathjs releases can be checked this way.',
  local:
    'A path on the server machine, not on your computer: a library’s folder with its package.json, or a packed .tgz. The server runs that code, which is why only admins may add one.',
  program:
    'A command the server and its workers start, without a shell: the program, then its arguments, separated by spaces. It must answer the stdio protocol (docs/stdio-protocol.md). Relative paths are read from the Sheetkeeper folder.',
};

/** The first rule broken in each field, keyed by the field's first name (`command.0` → `command`). */
function byField(issues: [field: string, rule: string][]): Partial<Record<Field | 'kind' | '(body)', string>> {
  const first: Record<string, string> = {};
  for (const [field, rule] of issues) first[field.split('.')[0]!] ??= rule;
  return first;
}

/**
 * Admins add a target here: an npm package at a version, a folder or tarball on the server, or a
 * program. Checked as it is typed with the schema the server applies (shared/target-source.ts), each
 * rule beside its field once that field was touched; the server's refusals land beside the fields
 * too. Adding answers at once: the list below shows the source resolving, then ready or failed.
 */
export function TargetSourceForm() {
  const [draft, setDraft] = useState<TargetSourceDraft>(EMPTY);
  const [touched, setTouched] = useState<ReadonlySet<string>>(new Set());
  const add = useAddTargetSource();
  const checked = targetSource.safeParse(targetSourceOfDraft(draft));
  const local = byField(checked.success ? [] : fieldIssues(checked.error).map((i) => [i.field, i.rule]));
  const server = byField(Object.entries(serverFieldErrors(add.error)));
  const other =
    add.error instanceof ApiRequestError
      ? add.error.body.kind === 'invalid-input'
        ? null
        : add.error.body.message
      : add.error
        ? 'The server could not be reached; nothing was added.'
        : null;

  const set = (field: Field) => (text: string) => {
    setDraft((d) => ({ ...d, [field]: text }));
    setTouched((t) => new Set(t).add(field));
    if (add.error) add.reset();
  };
  const errorOf = (field: Field) => (touched.has(field) ? local[field] : undefined) ?? server[field];

  const submit = () => {
    if (!checked.success) {
      setTouched(new Set(Object.keys(EMPTY)));
      return;
    }
    add.mutate(checked.data, {
      onSuccess: () => {
        setDraft({ ...EMPTY, kind: draft.kind });
        setTouched(new Set());
      },
    });
  };

  const field = (name: Field, label: string, placeholder: string) => (
    <TextField
      label={label}
      value={draft[name]}
      onChangeText={set(name)}
      error={errorOf(name)}
      placeholder={placeholder}
      autoCapitalize="none"
      mono
      testID={`target-source-${name}`}
    />
  );

  return (
    <View style={styles.form} testID="target-source-form">
      <ChipGroup
        label="Kind of target"
        options={KINDS}
        value={draft.kind}
        onChange={(kind) => {
          setDraft((d) => ({ ...d, kind }));
          if (add.error) add.reset();
        }}
      />
      <SkText variant="caption" style={styles.note}>
        {KIND_NOTES[draft.kind]}
      </SkText>
      {draft.kind === 'npm' ? (
        <>
          {field('package', 'Package', 'complex.js')}
          {field('version', 'Exact version', '2.4.3')}
        </>
      ) : null}
      {draft.kind === 'local'
        ? field('path', 'Path on the server', '/home/ci/complex.js or /tmp/complex.js-2.4.3.tgz')
        : null}
      {draft.kind === 'program' ? (
        <>
          {field('command', 'Command and arguments', '/usr/bin/python3 adapters/my_adapter.py')}
          {field('cwd', 'Working folder on the server (optional)', '/home/ci/adapters')}
        </>
      ) : null}
      {field('name', 'Target name (optional)', 'replaces library@version, e.g. complex.js@main')}
      {local['(body)'] && touched.size > 0 ? <FailureAlert message={local['(body)']} /> : null}
      {other ? <FailureAlert message={other} /> : null}
      <ActionButton label="Add target" onPress={submit} busy={add.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: theme.space(3) },
  note: { lineHeight: 20 },
});
