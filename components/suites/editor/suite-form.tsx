import { useDeferredValue, useMemo, useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { ApiRequestError } from '../../../client/api-request-error';
import { useSaveSuite } from '../../../client/use-save-suite';
import { useSubmitSuite } from '../../../client/use-submit-suite';
import { useKeptDraft } from '../../../client/use-kept-draft';
import { useSuiteTools } from '../../../client/use-suite-tools';
import { theme } from '../../../constants/theme';
import type { SuiteIssue } from '../../../shared/suite-issue';
import { fieldLabel } from '../../../shared/field-label';
import { validateSuite } from '../../../shared/validate-suite';
import { ActionButton } from '../../ui/action-button';
import { ChipGroup } from '../../ui/chip-group';
import { SkText } from '../../ui/sk-text';
import { ComplexInput } from './complex-input';
import { complexRules } from './complex-rules';
import { CutLayoutEditor } from './cut-layout-editor';
import { draftToSuiteBody } from './draft-to-suite-body';
import { emptyPathDraft } from './empty-path-draft';
import { emptyPropertyDraft } from './empty-property-draft';
import type { FieldRules } from './field-rules';
import { TitledPanel } from '../../ui/titled-panel';
import { FormTextInput } from '../../ui/form-text-input';
import { KeptDraftNotice } from './kept-draft-notice';
import { PathEditor } from './path-editor';
import { PropertyEditor } from './property-editor';
import { CounterpartEditor } from './counterpart-editor';
import { RuleLines } from '../../ui/rule-lines';
import { SmallButton } from '../../ui/small-button';
import type { SuiteDraft } from './suite-draft';
import { SuitePreview } from '../suite-preview';
import { ToggleChip } from '../../ui/toggle-chip';
import { ToleranceEditor } from './tolerance-editor';

interface ServerIssue {
  field: string;
  rule: string;
  /** The field's value when the server refused it: the rule shows until the field changes. */
  snapshot: string;
}

interface Props {
  initial: SuiteDraft;
  /** The suite's id when editing an existing suite; null for a new one. */
  editing: string | null;
  /** Where this device keeps unsaved work on this form (per user, and per suite version when editing). */
  draftKey: string;
  onDone: (slug: string, submitted: boolean) => void;
}

/** Whether a rule on `field` belongs to what the author has touched (`touched` is a field or a whole item). */
function related(touched: string, field: string): boolean {
  if (touched === field || field.startsWith(`${touched}.`) || touched.startsWith(`${field}.`)) return true;
  // A layout rule depends on g, ν and every cut alike.
  return field === 'branch.cuts' && touched.startsWith('branch');
}

function valueAt(body: unknown, field: string): string {
  let v: unknown = body;
  for (const key of field.split('.')) v = v && typeof v === 'object' ? (v as Record<string, unknown>)[key] : undefined;
  return JSON.stringify(v ?? null);
}

/**
 * The suite form: every field with its rule beside it (the shared schema plus the harness's
 * subject and cut-layout checks, the same function the server runs), a live picture of the
 * paths, cuts and branch points, and the server's own refusals beside the fields they name.
 * The draft lives in state, so a refused save loses nothing, and on this device until saved, so
 * a reload or a closed tab loses nothing either.
 */
export function SuiteForm({ initial, editing, draftKey, onDone }: Props) {
  const [draft, setDraft] = useState<SuiteDraft>(initial);
  const [touched, setTouched] = useState<string[]>([]);
  const [showAll, setShowAll] = useState(false);
  const [refused, setRefused] = useState(false);
  const [serverIssues, setServerIssues] = useState<ServerIssue[]>([]);
  const [serverMessage, setServerMessage] = useState<string | null>(null);
  const [savedSlug, setSavedSlug] = useState<string | null>(editing);
  const [dirty, setDirty] = useState(false);
  const kept = useKeptDraft(draftKey, initial, draft, dirty);
  const wide = useWindowDimensions().width >= theme.wide;
  const tools = useSuiteTools();
  const saveSuite = useSaveSuite(savedSlug);
  const submitSuite = useSubmitSuite();

  const body = useMemo(() => draftToSuiteBody(draft), [draft]);
  const deferredBody = useDeferredValue(body);
  const check = (b: unknown) =>
    tools.data ? tools.data.checkSuite(b, draft.id || 'the suite') : validateSuite(b, draft.id || 'the suite');
  const issues: SuiteIssue[] = useMemo(() => {
    const result = tools.data
      ? tools.data.checkSuite(deferredBody, 'the suite')
      : validateSuite(deferredBody, 'the suite');
    return result.ok ? [] : result.issues;
  }, [tools.data, deferredBody]);
  const visible = issues.filter((i) => showAll || touched.some((t) => related(t, i.field)));
  const liveServer = serverIssues.filter((s) => valueAt(body, s.field) === s.snapshot);

  const rules: FieldRules = (field, mode = 'exact') => {
    const match = (f: string) => f === field || (mode === 'within' && f.startsWith(`${field}.`));
    return [
      ...visible.filter((i) => match(i.field)).map((i) => i.rule),
      ...liveServer.filter((s) => match(s.field)).map((s) => s.rule),
    ];
  };

  const update = (field: string, patch: Partial<SuiteDraft> | ((d: SuiteDraft) => SuiteDraft)) => {
    setDraft((d) => (typeof patch === 'function' ? patch(d) : { ...d, ...patch }));
    setTouched((t) => (t.includes(field) ? t : [...t, field]));
    setRefused(false);
    setDirty(true);
  };

  const restore = (value: SuiteDraft) => {
    setDraft(value);
    setDirty(true);
    kept.dismissOffer();
  };

  const save = async (thenSubmit: boolean) => {
    setShowAll(true);
    setServerMessage(null);
    if (!check(body).ok) {
      setRefused(true);
      return;
    }
    setRefused(false);
    let slug: string;
    try {
      const version = await saveSuite.mutateAsync(body);
      slug = version.slug;
      setSavedSlug(slug);
      setServerIssues([]);
    } catch (e) {
      if (e instanceof ApiRequestError && e.body.kind === 'invalid-input') {
        setServerIssues(
          e.body.issues.map((i) => {
            const field = i.field.replace(/^body\./, '');
            return { field, rule: i.rule, snapshot: valueAt(body, field) };
          }),
        );
        setServerMessage('The server refused the suite: the rules it named are beside their fields.');
      } else {
        setServerMessage(e instanceof Error ? e.message : 'The server could not be reached.');
      }
      return;
    }
    // Saved on the server: nothing is left for this device to keep.
    setDirty(false);
    kept.forget();
    if (thenSubmit) {
      try {
        await submitSuite.mutateAsync(slug);
      } catch (e) {
        setServerMessage(
          `Saved as a draft, but not submitted: ${e instanceof Error ? e.message : 'the server could not be reached.'}`,
        );
        return;
      }
    }
    onDone(slug, thenSubmit);
  };

  const regular = draft.branchKind === 'regular';
  const preview = (
    <TitledPanel title="Preview" lead="Paths, cuts and branch points as the runner will see them, redrawn as you type.">
      <SuitePreview body={deferredBody} label="Preview of the suite" height={wide ? 360 : 300} testID="suite-preview" />
    </TitledPanel>
  );

  const form = (
    <View style={styles.column}>
      {kept.offer ? (
        <KeptDraftNotice
          savedAt={kept.offer.savedAt}
          onRestore={() => restore(kept.offer!.value)}
          onDiscard={kept.forget}
        />
      ) : null}
      <TitledPanel title="What it checks">
        <FormTextInput
          label="Id"
          hint="lower-case words joined by hyphens; it stays the same across versions"
          value={draft.id}
          onChangeText={(id) => update('id', { id })}
          rules={rules('id')}
          mono
          testID="suite-id"
        />
        <FormTextInput
          label="Title"
          value={draft.title}
          onChangeText={(title) => update('title', { title })}
          rules={rules('title')}
        />
        <FormTextInput
          label="Story"
          hint="why the suite exists: what a maintainer would break, and what the values pin down"
          value={draft.story}
          onChangeText={(story) => update('story', { story })}
          rules={rules('story')}
          multiline
        />
        <FormTextInput
          label="Subject"
          hint="a formula over z: sqrt, cbrt, nthroot, pow, exp, log, inverse trig and hyperbolic functions, + − * / ^"
          value={draft.subject}
          onChangeText={(subject) => update('subject', { subject })}
          rules={rules('subject')}
          mono
        />
      </TitledPanel>

      <TitledPanel
        title="Branch"
        lead="What the subject should equal: the principal branch of every function in it, or a regular branch of g(z)^ν fixed by its value at z0."
      >
        <ChipGroup
          label="Branch spec"
          options={[
            { value: 'principal', text: 'principal' },
            { value: 'regular', text: 'regular branch of g(z)^ν' },
          ]}
          value={draft.branchKind}
          onChange={(branchKind) => update('branch', { branchKind })}
        />
        <RuleLines rules={rules('branch').map((r) => `Branch ${r}`)} />
        {regular ? (
          <>
            <FormTextInput
              label="g(z)"
              hint="a rational function of z, e.g. z*(z - 1)"
              value={draft.g}
              onChangeText={(g) => update('branch.g', { g })}
              rules={rules('branch.g')}
              mono
            />
            <View style={styles.row}>
              <FormTextInput
                label="ν"
                hint='"1/3", "0.5"'
                value={draft.nuRe}
                onChangeText={(nuRe) => update('branch.nu', { nuRe })}
                rules={[...rules('branch.nu'), ...rules('branch.nu.re')]}
                mono
              />
              <FormTextInput
                label="ν, imaginary part"
                hint="blank for a real ν"
                value={draft.nuIm}
                onChangeText={(nuIm) => update('branch.nu', { nuIm })}
                rules={rules('branch.nu.im')}
                mono
              />
            </View>
            <ComplexInput
              label="Reference point z0"
              value={draft.z0}
              onChange={(z0) => update('branch.z0', { z0 })}
              rules={complexRules(rules, 'branch.z0')}
            />
            <ChipGroup
              label="Fixed by"
              options={[
                { value: 'k', text: 'the k-th value (0 is the principal one)' },
                { value: 'f0', text: 'a value f0 at z0' },
              ]}
              value={draft.fixBy}
              onChange={(fixBy) => update('branch.f0', { fixBy })}
            />
            {draft.fixBy === 'k' ? (
              <FormTextInput
                label="k"
                hint="0 is the principal value at z0"
                value={draft.k}
                onChangeText={(k) => update('branch.k', { k })}
                rules={rules('branch.k')}
                mono
              />
            ) : (
              <ComplexInput
                label="Value f0 at z0"
                value={draft.f0}
                onChange={(f0) => update('branch.f0', { f0 })}
                rules={complexRules(rules, 'branch.f0')}
              />
            )}
            <CutLayoutEditor cuts={draft.cuts} onChange={(cuts) => update('branch.cuts', { cuts })} rules={rules} />
          </>
        ) : null}
        <ChipGroup
          label="Convention on the cuts"
          options={[
            { value: 'signed-zero', text: 'signed zero (Annex G)' },
            { value: 'counter-clockwise', text: 'counter-clockwise continuity' },
          ]}
          value={draft.convention}
          onChange={(convention) => update('convention', { convention })}
        />
        <RuleLines rules={rules('convention')} />
      </TitledPanel>

      <TitledPanel
        title="Paths"
        lead="Where the subject is evaluated. t runs over [0, 1]: the angle on a circle, the fraction of arc length on a polyline."
      >
        <RuleLines rules={rules('paths').map((r) => `Paths ${r}`)} />
        {draft.paths.map((p, i) => (
          <PathEditor
            key={i}
            path={p}
            index={i}
            rules={rules}
            onChange={(next) =>
              update(`paths.${i}`, (d) => ({ ...d, paths: d.paths.map((q, j) => (j === i ? next : q)) }))
            }
            onRemove={() => update('paths', (d) => ({ ...d, paths: d.paths.filter((_, j) => j !== i) }))}
          />
        ))}
        <SmallButton
          label="+ Add a path"
          onPress={() =>
            update(`paths.${draft.paths.length}`, (d) => ({
              ...d,
              paths: [...d.paths, emptyPathDraft(`path ${d.paths.length + 1}`)],
            }))
          }
        />
      </TitledPanel>

      {wide ? null : preview}

      <TitledPanel title="Tolerances" lead="How far a value may be from the reference before it fails.">
        <ToleranceEditor
          label="Values"
          value={draft.tolerances.values}
          onChange={(values) => update('tolerances', (d) => ({ ...d, tolerances: { ...d.tolerances, values } }))}
          rules={rules}
          field="tolerances.values"
        />
        <ToggleChip
          label="Monodromy has its own tolerance"
          value={draft.tolerances.monodromy !== null}
          onChange={(on) =>
            update('tolerances', (d) => ({
              ...d,
              tolerances: { ...d.tolerances, monodromy: on ? { kind: 'relative', value: '1e-12' } : null },
            }))
          }
        />
        {draft.tolerances.monodromy ? (
          <ToleranceEditor
            label="Monodromy"
            value={draft.tolerances.monodromy}
            onChange={(monodromy) =>
              update('tolerances', (d) => ({ ...d, tolerances: { ...d.tolerances, monodromy } }))
            }
            rules={rules}
            field="tolerances.monodromy"
          />
        ) : null}
        <ToggleChip
          label="Property checks have their own tolerance"
          value={draft.tolerances.properties !== null}
          onChange={(on) =>
            update('tolerances', (d) => ({
              ...d,
              tolerances: { ...d.tolerances, properties: on ? { kind: 'ulps', value: '4' } : null },
            }))
          }
        />
        {draft.tolerances.properties ? (
          <ToleranceEditor
            label="Properties"
            value={draft.tolerances.properties}
            onChange={(properties) =>
              update('tolerances', (d) => ({ ...d, tolerances: { ...d.tolerances, properties } }))
            }
            rules={rules}
            field="tolerances.properties"
          />
        ) : null}
      </TitledPanel>

      <TitledPanel
        title="Property checks"
        lead="Laws checked on the library's own values at random points (seeded, so a failure can be replayed)."
      >
        <RuleLines rules={rules('properties').map((r) => `Property checks ${r}`)} />
        {draft.properties.length === 0 ? (
          <SkText variant="caption" tone="inkFaint">
            No property checks.
          </SkText>
        ) : null}
        {draft.properties.map((p, i) => (
          <PropertyEditor
            key={i}
            value={p}
            index={i}
            rules={rules}
            onChange={(next) =>
              update(`properties.${i}`, (d) => ({ ...d, properties: d.properties.map((q, j) => (j === i ? next : q)) }))
            }
            onRemove={() => update('properties', (d) => ({ ...d, properties: d.properties.filter((_, j) => j !== i) }))}
          />
        ))}
        <SmallButton
          label="+ Add a property check"
          onPress={() =>
            update(`properties.${draft.properties.length}`, (d) => ({
              ...d,
              properties: [...d.properties, emptyPropertyDraft()],
            }))
          }
        />
      </TitledPanel>

      <TitledPanel
        title="Counterparts"
        lead="Other ways to compute the subject through the same library, which must give the same value at every point: another subject (z^(1/2) beside sqrt(z)), another entry of the target, or both. A point where they differ is a disagreement."
      >
        <RuleLines rules={rules('counterparts').map((r) => `Counterparts ${r}`)} />
        {draft.counterparts.length === 0 ? (
          <SkText variant="caption" tone="inkFaint">
            No counterparts.
          </SkText>
        ) : null}
        {draft.counterparts.map((c, i) => (
          <CounterpartEditor
            key={i}
            value={c}
            index={i}
            rules={rules}
            onChange={(next) =>
              update(`counterparts.${i}`, (d) => ({
                ...d,
                counterparts: d.counterparts.map((q, j) => (j === i ? next : q)),
              }))
            }
            onRemove={() =>
              update('counterparts', (d) => ({ ...d, counterparts: d.counterparts.filter((_, j) => j !== i) }))
            }
          />
        ))}
        <SmallButton
          label="+ Add a counterpart"
          onPress={() =>
            update(`counterparts.${draft.counterparts.length}`, (d) => ({
              ...d,
              counterparts: [...d.counterparts, { subject: '', entry: '' }],
            }))
          }
        />
      </TitledPanel>

      <View style={styles.footer}>
        {refused ? (
          <View style={styles.refusal} accessibilityRole="alert" testID="suite-form-refused">
            <SkText variant="label" tone="danger">
              × Not saved: {visible.length} {visible.length === 1 ? 'rule is' : 'rules are'} broken. Nothing you typed
              is lost.
            </SkText>
            {visible.map((i, k) => (
              <SkText variant="caption" tone="ink" key={k}>
                • {fieldLabel(i.field)}: {i.rule}
              </SkText>
            ))}
          </View>
        ) : null}
        {serverMessage ? (
          <SkText
            variant="label"
            tone="danger"
            accessibilityRole="alert"
            style={styles.serverMessage}
            testID="suite-form-server-message"
          >
            × {serverMessage}
          </SkText>
        ) : null}
        <View style={styles.buttons}>
          <ActionButton
            label="Save draft"
            tone="quiet"
            onPress={() => void save(false)}
            busy={saveSuite.isPending && !submitSuite.isPending}
          />
          <ActionButton
            label="Save and submit for review"
            onPress={() => void save(true)}
            busy={submitSuite.isPending}
          />
        </View>
      </View>
    </View>
  );

  if (!wide) return form;
  return (
    <View style={styles.wide}>
      <View style={styles.formColumn}>{form}</View>
      <View style={styles.previewColumn}>{preview}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flexDirection: 'row', gap: theme.space(4), alignItems: 'flex-start' },
  formColumn: { flex: 3, minWidth: 0 },
  // On the web the picture stays in view while the long form scrolls beside it (react-native-web passes "sticky" through).
  previewColumn: { flex: 2, minWidth: 0, position: 'sticky' as 'relative', top: theme.space(4) },
  column: { gap: theme.space(4) },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
  footer: { gap: theme.space(3) },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
  refusal: {
    backgroundColor: theme.color.dangerSoft,
    borderRadius: theme.radius,
    padding: theme.space(3),
    gap: theme.space(1),
  },
  serverMessage: { backgroundColor: theme.color.dangerSoft, padding: theme.space(3), borderRadius: theme.radius },
});
