import { useState } from 'react';
import { StyleSheet, Text, TextInput, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { useClassifyFailure } from '../../client/use-classify-failure';
import { theme } from '../../constants/theme';
import type { DecisionVersions } from '../../shared/decision-versions';
import { describeDecisionScope } from '../../shared/describe-decision-scope';
import type { Role } from '../../shared/roles';
import { classifyBody, type ClassifyBody } from '../../shared/schemas/classify-body';
import { CLASSIFICATION_WORDS } from '../decisions/classification-words';
import { ActionButton } from '../ui/action-button';
import { ChipGroup } from '../ui/chip-group';
import { DoneNote } from '../ui/done-note';
import { INPUT_BOX_STYLE } from '../ui/input-box-style';
import { SkText } from '../ui/sk-text';
import { TextField } from '../ui/text-field';

type Field = 'classification' | 'scope' | 'versions' | 'reason' | 'expiresAt';

// Words alone: a glyph on an unchosen chip read as a state (a ✓ on "accepted" looked chosen), and
// ⇄ already means the other side of a cut (constants/glyphs.ts).
const VERDICTS: { value: ClassifyBody['classification']; text: string }[] = [
  { value: 'bug', text: CLASSIFICATION_WORDS.bug },
  { value: 'convention-difference', text: CLASSIFICATION_WORDS['convention-difference'] },
  { value: 'accepted', text: CLASSIFICATION_WORDS.accepted },
];
const SCOPES: { value: ClassifyBody['scope']; text: string }[] = [
  { value: 'point', text: 'this point' },
  { value: 'path', text: 'this path' },
  { value: 'suite', text: 'this suite' },
  { value: 'diagnosis', text: 'this diagnosis in the suite' },
];
const versionChips = (version: string): { value: DecisionVersions; text: string }[] => [
  { value: 'this-version', text: `${version} only` },
  { value: 'this-and-later', text: `${version} and later` },
  { value: 'every-version', text: 'every version, earlier ones too' },
];

const FIELD_NAMES: Record<Field, string> = {
  classification: 'Verdict',
  scope: 'Covers',
  versions: 'Versions',
  reason: 'Reason',
  expiresAt: 'Expiry day',
};

/** The failure a verdict is given on: what its scope is made of. */
interface ClassifiedFailure {
  id: string;
  targetKey: string;
  targetVersion: string;
  suiteSlug: string;
  pathName: string;
  diagnosisKind: string | null;
}

/**
 * A verdict on a failure: reviewers and admins call it a bug, a convention difference or an
 * accepted deviation; maintainers may only accept a deviation (the server enforces the same).
 * The form says in one sentence what the verdict will cover (which failures, which library, which
 * of its versions) before it is saved, in the words the Decisions screen shows it with after.
 * Checked with the server's schema before sending; the server's rules come back beside the same
 * fields, and nothing typed is lost on a refusal.
 */
export function ClassifyForm({ failure, role }: { failure: ClassifiedFailure; role: Role }) {
  const failureId = failure.id;
  const hasDiagnosis = failure.diagnosisKind !== null;
  const maintainer = role === 'maintainer';
  const [classification, setClassification] = useState<ClassifyBody['classification'] | undefined>(
    maintainer ? 'accepted' : undefined,
  );
  const [scope, setScope] = useState<ClassifyBody['scope']>('point');
  // The narrowest choice first: a wider one is a choice the reader makes with the sentence below in view.
  const [versions, setVersions] = useState<DecisionVersions>('this-version');
  const [reason, setReason] = useState('');
  const [expires, setExpires] = useState('');
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  const classify = useClassifyFailure(failureId);
  const [done, setDone] = useState<string | null>(null);

  const submit = () => {
    setDone(null);
    const parsed = classifyBody.safeParse({
      classification,
      scope,
      versions,
      reason,
      expiresAt: expires.trim() === '' ? undefined : expires,
    });
    if (!parsed.success) {
      const found: Partial<Record<Field, string>> = {};
      for (const issue of parsed.error.issues) {
        const field = String(issue.path[0] ?? 'reason') as Field;
        found[field] ??= issue.message;
      }
      setErrors(found);
      return;
    }
    setErrors({});
    classify.mutate(parsed.data, {
      onSuccess: (res) => {
        const d = res.deviation;
        setDone(
          `✓ Recorded: ${CLASSIFICATION_WORDS[d.classification]} covering ${describeDecisionScope(d)}${d.expiresAt ? `, until ${d.expiresAt.slice(0, 10)}` : ''}. It is listed on the Decisions screen.`,
        );
        setReason('');
        setExpires('');
      },
      onError: (error) => {
        if (error instanceof ApiRequestError && error.body.kind === 'invalid-input') {
          const found: Partial<Record<Field, string>> = {};
          for (const issue of error.body.issues) found[issue.field.replace(/^body\./, '') as Field] ??= issue.rule;
          setErrors(found);
        }
      },
    });
  };

  const formError =
    classify.error && !(classify.error instanceof ApiRequestError && classify.error.body.kind === 'invalid-input')
      ? classify.error.message
      : null;
  const fieldError = (f: Field) =>
    errors[f] ? (
      <SkText variant="caption" tone="danger" accessibilityRole="alert" style={styles.error}>
        × {FIELD_NAMES[f]} {errors[f]}
      </SkText>
    ) : null;

  return (
    <View style={styles.form}>
      {maintainer ? (
        <SkText variant="caption" style={styles.note}>
          As a maintainer you may accept a deviation your library lives with; calling a failure a bug or a convention
          difference is a reviewer&apos;s call.
        </SkText>
      ) : null}
      <View>
        <ChipGroup
          label="Verdict"
          value={classification}
          onChange={(v) => {
            setClassification(v);
            setErrors({ ...errors, classification: undefined });
          }}
          options={maintainer ? VERDICTS.filter((v) => v.value === 'accepted') : VERDICTS}
        />
        {fieldError('classification')}
      </View>
      <View>
        <ChipGroup
          label="Covers"
          value={scope}
          onChange={(v) => setScope(v ?? 'point')}
          options={hasDiagnosis ? SCOPES : SCOPES.filter((s) => s.value !== 'diagnosis')}
        />
        {fieldError('scope')}
      </View>
      <View>
        <ChipGroup
          label={`Versions of ${failure.targetKey}`}
          groupLabel="Versions"
          value={versions}
          onChange={(v) => setVersions(v)}
          options={versionChips(failure.targetVersion)}
        />
        {fieldError('versions')}
      </View>
      <SkText variant="body" testID="decision-scope" accessibilityLiveRegion="polite">
        Saving covers{' '}
        {describeDecisionScope({
          scope,
          versions,
          targetKey: failure.targetKey,
          targetVersion: failure.targetVersion,
          suiteSlug: failure.suiteSlug,
          pathName: scope === 'path' ? failure.pathName : null,
          diagnosisKind: scope === 'diagnosis' ? failure.diagnosisKind : null,
          failureId,
        })}
        .
      </SkText>
      <View style={styles.field}>
        <SkText variant="smallLabel" style={styles.label}>
          Reason
        </SkText>
        <TextInput
          accessibilityLabel="Reason"
          aria-invalid={errors.reason ? true : undefined}
          multiline
          numberOfLines={3}
          value={reason}
          onChangeText={(t) => {
            setReason(t);
            if (errors.reason) setErrors({ ...errors, reason: undefined });
          }}
          style={[styles.input, errors.reason ? styles.inputError : null]}
        />
        {fieldError('reason')}
      </View>
      <View>
        <TextField
          label={
            classification === 'accepted'
              ? 'Expires on (a day like 2027-01-31, required)'
              : 'Expires on (a day like 2027-01-31, optional)'
          }
          value={expires}
          onChangeText={(t) => {
            setExpires(t);
            if (errors.expiresAt) setErrors({ ...errors, expiresAt: undefined });
          }}
          autoCapitalize="none"
        />
        {fieldError('expiresAt')}
      </View>
      {formError ? (
        <Text accessibilityRole="alert" style={styles.formError}>
          × {formError}
        </Text>
      ) : null}
      {done ? <DoneNote text={done} /> : null}
      <ActionButton
        label={classification === 'accepted' ? 'Accept deviation' : 'Record verdict'}
        busy={classify.isPending}
        onPress={submit}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: theme.space(4) },
  note: { lineHeight: 19 },
  field: { gap: theme.space(1) },
  label: { letterSpacing: 0.3 },
  input: { ...INPUT_BOX_STYLE, minHeight: 88, padding: theme.space(3), textAlignVertical: 'top' },
  inputError: { borderColor: theme.color.danger, borderWidth: 2 },
  error: { marginTop: theme.space(1) },
  formError: {
    fontFamily: theme.font.medium,
    color: theme.color.danger,
    backgroundColor: theme.color.dangerSoft,
    padding: theme.space(3),
    borderRadius: theme.radius,
  },
});
