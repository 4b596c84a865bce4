import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { refusalMessage } from '../../client/refusal-message';
import { formatDate } from '../../client/format-date';
import { useDeletePlan } from '../../client/use-delete-plan';
import { theme } from '../../constants/theme';
import type { PlanView } from '../../shared/plan-view';
import { ActionButton } from '../ui/action-button';
import { ConfirmAction } from '../ui/confirm-action';
import { SkText } from '../ui/sk-text';
import { FindingsByKind } from './findings-by-kind';
import { PlanForm } from './plan-form';
import { PlanLatestRun } from './plan-latest-run';
import { PlanSchedules } from './plan-schedules';
import { StartRunButton } from './start-run-button';
import { TitledPanel } from '../ui/titled-panel';

/**
 * One plan: what a run of it checks (suites × targets), its latest run and verdict, who hears
 * about it, its schedules, and for editors Run now, edit and delete. Says plainly what a run does and does not establish.
 */
export function PlanDetail({ plan, canEdit }: { plan: PlanView; canEdit: boolean }) {
  const wide = useWindowDimensions().width >= theme.wide;
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const remove = useDeletePlan();
  const removeFailure = refusalMessage(remove.error, 'The server could not be reached.');
  const missing = plan.targets.filter((t) => !t.installed);
  const pairs = plan.suites.filter((s) => s.approvedVersion !== null).length * (plan.targets.length - missing.length);

  if (editing) return <PlanForm plan={plan} onSaved={() => setEditing(false)} onCancel={() => setEditing(false)} />;

  const contents = (
    <View style={styles.column}>
      <TitledPanel title={`Suites (${plan.suites.length})`} lead="A run takes each suite's newest approved version.">
        <View style={styles.items}>
          {plan.suites.map((s) => (
            <View key={s.slug} style={styles.item}>
              <SkText variant="label">{s.title}</SkText>
              <Text style={styles.itemDetail}>
                {s.slug} ·{' '}
                {s.approvedVersion === null
                  ? '− no approved version: skipped by runs'
                  : `v${s.approvedVersion} approved`}
              </Text>
            </View>
          ))}
        </View>
      </TitledPanel>
      <TitledPanel title={`Targets (${plan.targets.length})`}>
        <View style={styles.items}>
          {plan.targets.map((t) => (
            <View key={t.name} style={styles.targetRow}>
              <SkText variant="mono">{t.name}</SkText>
              <SkText variant="caption" tone={t.installed ? 'accent' : 'danger'}>
                {t.installed ? '✓ installed' : '− not installed'}
              </SkText>
            </View>
          ))}
        </View>
        {missing.length > 0 ? (
          <SkText variant="caption" tone="danger">
            Runs skip targets that are not installed on this server.
          </SkText>
        ) : null}
      </TitledPanel>
    </View>
  );

  const side = (
    <View style={styles.column}>
      {canEdit ? (
        <TitledPanel
          title="Run"
          lead={`Checks ${pairs} suite × target ${pairs === 1 ? 'pair' : 'pairs'} now: approved suites on installed targets.`}
        >
          <StartRunButton planId={plan.id} planName={plan.name} />
        </TitledPanel>
      ) : null}
      <PlanLatestRun planId={plan.id} planName={plan.name} />
      <PlanSchedules planId={plan.id} canEdit={canEdit} />
      <TitledPanel title="Regression mail">
        {plan.recipients.length === 0 ? (
          <SkText variant="caption">
            No recipients named here; people subscribed to these libraries still hear about regressions.
          </SkText>
        ) : (
          plan.recipients.map((r) => (
            <SkText variant="mono" key={r}>
              • {r}
            </SkText>
          ))
        )}
      </TitledPanel>
    </View>
  );

  return (
    <View style={styles.detail} testID="plan-detail">
      {plan.description ? (
        <SkText variant="body" tone="inkSoft" style={styles.description}>
          {plan.description}
        </SkText>
      ) : null}
      <SkText variant="caption" tone="inkFaint">
        By {plan.createdBy} · changed {formatDate(plan.updatedAt)} · id <Text style={styles.mono}>{plan.id}</Text>
      </SkText>
      <View style={styles.note}>
        <SkText variant="caption" style={styles.noteText}>
          A run checks only the points, paths, conventions and properties written in these suites, on these targets. A
          clean run is evidence for those checks, not a certificate for the library.
        </SkText>
      </View>
      <FindingsByKind planId={plan.id} />
      {/* On a phone, running and scheduling come first: the suite list can be long. Keyed, so turning
          the screen moves the panels without remounting them (a schedule being edited keeps its text). */}
      <View style={[styles.layout, wide && styles.layoutWide]}>
        {(wide ? ['contents', 'side'] : ['side', 'contents']).map((part) => (
          <View key={part} style={wide ? (part === 'contents' ? styles.main : styles.aside) : undefined}>
            {part === 'contents' ? contents : side}
          </View>
        ))}
      </View>
      {canEdit ? (
        <View style={styles.manage}>
          <ActionButton label="Edit plan" tone="quiet" onPress={() => setEditing(true)} />
          <ConfirmAction
            label="Delete plan"
            accessibilityLabel={`Delete plan ${plan.name}`}
            question={`Delete “${plan.name}” and its schedules? Past runs stay.`}
            confirmLabel="Yes, delete"
            busy={remove.isPending}
            onConfirm={() => remove.mutate(plan.id, { onSuccess: () => router.replace('/plans') })}
          />
          {removeFailure ? (
            <SkText variant="caption" tone="danger" accessibilityRole="alert">
              ❌ {removeFailure}
            </SkText>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  detail: { gap: theme.space(4) },
  description: { lineHeight: 24 },
  mono: { fontFamily: theme.font.mono },
  note: { borderLeftWidth: 3, borderLeftColor: theme.color.focus, paddingLeft: theme.space(3) },
  noteText: { lineHeight: 20 },
  layout: { gap: theme.space(4) },
  layoutWide: { flexDirection: 'row', alignItems: 'flex-start' },
  main: { flex: 3 },
  aside: { flex: 2 },
  column: { gap: theme.space(4) },
  items: { gap: theme.space(2) },
  item: { gap: 2 },
  itemDetail: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
  targetRow: { flexDirection: 'row', justifyContent: 'space-between', gap: theme.space(2), flexWrap: 'wrap' },
  manage: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2), alignItems: 'flex-start' },
});
