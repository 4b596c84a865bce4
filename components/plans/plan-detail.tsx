import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { formatDate } from '../../client/format-date';
import { useDeletePlan } from '../../client/use-delete-plan';
import { theme } from '../../constants/theme';
import type { PlanView } from '../../shared/plan-view';
import { ActionButton } from '../ui/action-button';
import { ConfirmAction } from '../ui/confirm-action';
import { PlanForm } from './plan-form';
import { PlanSchedules } from './plan-schedules';
import { StartRunButton } from './start-run-button';
import { TitledPanel } from '../ui/titled-panel';

/**
 * One plan: what a run of it checks (suites × targets), who hears about it, its schedules, and
 * for editors Run now, edit and delete. Says plainly what a run does and does not establish.
 */
export function PlanDetail({ plan, canEdit }: { plan: PlanView; canEdit: boolean }) {
  const wide = useWindowDimensions().width >= theme.wide;
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const remove = useDeletePlan();
  const removeFailure =
    remove.error instanceof ApiRequestError
      ? remove.error.body.message
      : remove.error
        ? 'The server could not be reached.'
        : null;
  const missing = plan.targets.filter((t) => !t.installed);
  const pairs = plan.suites.filter((s) => s.approvedVersion !== null).length * (plan.targets.length - missing.length);

  if (editing) return <PlanForm plan={plan} onSaved={() => setEditing(false)} onCancel={() => setEditing(false)} />;

  const contents = (
    <View style={styles.column}>
      <TitledPanel title={`Suites (${plan.suites.length})`} lead="A run takes each suite's newest approved version.">
        <View style={styles.items}>
          {plan.suites.map((s) => (
            <View key={s.slug} style={styles.item}>
              <Text style={styles.itemTitle}>{s.title}</Text>
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
              <Text style={styles.target}>{t.name}</Text>
              <Text style={[styles.installed, !t.installed && styles.missing]}>
                {t.installed ? '✓ installed' : '− not installed'}
              </Text>
            </View>
          ))}
        </View>
        {missing.length > 0 ? (
          <Text style={styles.missing}>Runs skip targets that are not installed on this server.</Text>
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
      <PlanSchedules planId={plan.id} canEdit={canEdit} />
      <TitledPanel title="Regression mail">
        {plan.recipients.length === 0 ? (
          <Text style={styles.muted}>
            No recipients named here; people subscribed to these libraries still hear about regressions.
          </Text>
        ) : (
          plan.recipients.map((r) => (
            <Text key={r} style={styles.recipient}>
              • {r}
            </Text>
          ))
        )}
      </TitledPanel>
    </View>
  );

  return (
    <View style={styles.detail} testID="plan-detail">
      {plan.description ? <Text style={styles.description}>{plan.description}</Text> : null}
      <Text style={styles.meta}>
        By {plan.createdBy} · changed {formatDate(plan.updatedAt)} · id <Text style={styles.mono}>{plan.id}</Text>
      </Text>
      <View style={styles.note}>
        <Text style={styles.noteText}>
          A run checks only the points, paths, conventions and properties written in these suites, on these targets. A
          clean run is evidence for those checks, not a certificate for the library.
        </Text>
      </View>
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
            onConfirm={() => remove.mutate(plan.id, { onSuccess: () => router.replace('/plans' as never) })}
          />
          {removeFailure ? (
            <Text accessibilityRole="alert" style={styles.missing}>
              ❌ {removeFailure}
            </Text>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  detail: { gap: theme.space(4) },
  description: {
    fontFamily: theme.font.regular,
    fontSize: theme.size.body,
    color: theme.color.inkSoft,
    lineHeight: 24,
  },
  meta: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkFaint },
  mono: { fontFamily: theme.font.mono },
  note: { borderLeftWidth: 3, borderLeftColor: theme.color.focus, paddingLeft: theme.space(3) },
  noteText: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft, lineHeight: 20 },
  layout: { gap: theme.space(4) },
  layoutWide: { flexDirection: 'row', alignItems: 'flex-start' },
  main: { flex: 3 },
  aside: { flex: 2 },
  column: { gap: theme.space(4) },
  items: { gap: theme.space(2) },
  item: { gap: 2 },
  itemTitle: { fontFamily: theme.font.medium, fontSize: theme.size.body, color: theme.color.ink },
  itemDetail: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
  targetRow: { flexDirection: 'row', justifyContent: 'space-between', gap: theme.space(2), flexWrap: 'wrap' },
  target: { fontFamily: theme.font.mono, fontSize: theme.size.small, color: theme.color.ink },
  installed: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.accent },
  missing: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.danger },
  muted: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft },
  recipient: { fontFamily: theme.font.mono, fontSize: theme.size.small, color: theme.color.ink },
  manage: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2), alignItems: 'flex-start' },
});
