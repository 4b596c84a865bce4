import { useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { serverFieldErrors } from '../../client/server-field-errors';
import { usePlanChoices } from '../../client/use-plan-choices';
import { useSavePlan } from '../../client/use-save-plan';
import { theme } from '../../constants/theme';
import type { PlanView } from '../../shared/plan-view';
import { planBody } from '../../shared/schemas/plan-body';
import { FormActions } from '../ui/form-actions';
import { SkText } from '../ui/sk-text';
import { CheckList } from './check-list';
import { QueryState } from '../ui/query-state';
import { TextField } from '../ui/text-field';

type Field = 'name' | 'description' | 'recipients' | 'suites' | 'targets';
const FIELDS: Field[] = ['name', 'description', 'recipients', 'suites', 'targets'];

/** Recipients are typed as one text, separated by commas, spaces or new lines. */
const splitAddresses = (text: string) => text.split(/[\s,;]+/).filter((a) => a.length > 0);

/**
 * Creates or edits a plan: name, description, who hears about regressions, suites × targets.
 * Checked with the server's schema before sending; the server's own answer (a suite without an
 * approved version, a target no longer installed, a name already taken) shows beside its field,
 * and everything typed stays.
 */
export function PlanForm({
  plan,
  onSaved,
  onCancel,
}: {
  plan?: PlanView;
  onSaved: (plan: PlanView) => void;
  onCancel: () => void;
}) {
  const choices = usePlanChoices();
  const save = useSavePlan(plan?.id ?? null);
  const wide = useWindowDimensions().width >= theme.wide;
  const [name, setName] = useState(plan?.name ?? '');
  const [description, setDescription] = useState(plan?.description ?? '');
  const [recipients, setRecipients] = useState(plan?.recipients.join(', ') ?? '');
  const [suites, setSuites] = useState<string[]>(plan?.suites.map((s) => s.slug) ?? []);
  const [targets, setTargets] = useState<string[]>(plan?.targets.map((t) => t.name) ?? []);
  const [clientErrors, setClientErrors] = useState<Partial<Record<Field, string>>>({});
  const [submitted, setSubmitted] = useState(false);

  const values = () => ({ name, description, recipients: splitAddresses(recipients), suites, targets });

  const validate = (body: ReturnType<typeof values>) => {
    const result = planBody.safeParse(body);
    const errors: Partial<Record<Field, string>> = {};
    if (!result.success) {
      for (const issue of result.error.issues) {
        const [field, index] = issue.path;
        if (!FIELDS.includes(field as Field) || errors[field as Field]) continue;
        // An element's rule names the element, so "recipients.1 must be an e-mail address" says which one.
        const element =
          typeof index === 'number'
            ? (body[field as 'recipients' | 'suites' | 'targets'] as string[])[index]
            : undefined;
        errors[field as Field] = element !== undefined ? `“${element}” ${issue.message}` : issue.message;
      }
    }
    setClientErrors(errors);
    return result;
  };

  // Re-check as the person fixes things, but only once they have tried to save.
  const recheck = (patch: Partial<ReturnType<typeof values>>) => {
    if (submitted) validate({ ...values(), ...patch });
  };

  const submit = () => {
    setSubmitted(true);
    const result = validate(values());
    if (!result.success) return;
    save.mutate(result.data, { onSuccess: (plan) => onSaved(plan) });
  };

  const fromServer = serverFieldErrors(save.error);
  const serverErrorOf = (field: Field) =>
    Object.entries(fromServer)
      .filter(([key]) => key === field || key.startsWith(`${field}.`))
      .map(([, rule]) => rule)
      .join('; ') || undefined;
  const errorOf = (field: Field) => clientErrors[field] ?? serverErrorOf(field);
  const other =
    save.error instanceof ApiRequestError
      ? save.error.body.kind === 'invalid-input'
        ? FIELDS.some((f) => serverErrorOf(f))
          ? null
          : save.error.body.issues.map((i) => `${i.field} ${i.rule}`).join('; ')
        : save.error.body.message
      : save.error
        ? 'The server could not be reached; nothing was saved.'
        : null;

  if (choices.isPending) return <QueryState state="loading" />;
  if (choices.isError)
    return <QueryState state="error" message={choices.error.message} onRetry={() => void choices.refetch()} />;

  const approved = choices.data.suites.filter((s) => s.approvedVersion !== null);
  const waiting = choices.data.suites.length - approved.length;
  const suiteItems = [
    ...approved.map((s) => ({ key: s.slug, title: s.title, detail: `${s.slug} · v${s.approvedVersion} approved` })),
    // A suite already in the plan that lost its approval stays visible, so it can be taken out.
    ...suites
      .filter((slug) => !approved.some((s) => s.slug === slug))
      .map((slug) => ({ key: slug, title: slug, detail: slug, blocked: 'no approved version' })),
  ];
  const targetItems = [
    ...choices.data.targets
      .filter((t) => t.installed)
      .map((t) => ({ key: t.name, title: t.name, detail: `${t.library} ${t.version}` })),
    ...targets
      .filter((name) => !choices.data.targets.some((t) => t.installed && t.name === name))
      .map((name) => ({ key: name, title: name, blocked: 'not installed on this server' })),
  ];

  return (
    <View style={styles.form} testID="plan-form">
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={[styles.column, wide && styles.columnNarrow]}>
          <TextField
            label="Name"
            value={name}
            onChangeText={(text) => {
              setName(text);
              recheck({ name: text });
            }}
            error={errorOf('name')}
            testID="plan-name"
          />
          <TextField
            label="Description"
            value={description}
            onChangeText={(text) => {
              setDescription(text);
              recheck({ description: text });
            }}
            error={errorOf('description')}
            multiline
            testID="plan-description"
          />
          <TextField
            label="Recipients"
            value={recipients}
            onChangeText={(text) => {
              setRecipients(text);
              recheck({ recipients: splitAddresses(text) });
            }}
            error={errorOf('recipients')}
            placeholder="name@example.org, another@example.org"
            autoCapitalize="none"
            keyboardType="email-address"
            multiline
            testID="plan-recipients"
          />
          <SkText variant="caption" style={styles.help}>
            Who gets the regression mail of this plan, separated by commas. People can also subscribe to a library in
            their Settings.
          </SkText>
        </View>
        <View style={[styles.column, wide && styles.columnWide]}>
          <CheckList
            label="Suites"
            items={suiteItems}
            selected={suites}
            onChange={(next) => {
              setSuites(next);
              recheck({ suites: next });
            }}
            error={errorOf('suites')}
            testID="plan-suites"
          />
          <SkText variant="caption" style={styles.help}>
            Only suites with an approved version can join; a run uses each suite&apos;s newest approved version.
            {waiting > 0 ? ` ${waiting} ${waiting === 1 ? 'suite is' : 'suites are'} still waiting for review.` : ''}
          </SkText>
          <CheckList
            label="Targets"
            items={targetItems}
            selected={targets}
            onChange={(next) => {
              setTargets(next);
              recheck({ targets: next });
            }}
            error={errorOf('targets')}
            testID="plan-targets"
          />
        </View>
      </View>
      <FormActions
        failure={other}
        saveLabel={plan ? 'Save plan' : 'Create plan'}
        onSave={submit}
        busy={save.isPending}
        onCancel={onCancel}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: theme.space(4) },
  columns: { gap: theme.space(4) },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { gap: theme.space(3) },
  columnNarrow: { flex: 2 },
  columnWide: { flex: 3 },
  help: { lineHeight: 20 },
});
