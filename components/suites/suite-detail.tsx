import { Link, type Href } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';
import { useMe } from '../../client/use-me';
import { useRetireSuite } from '../../client/use-retire-suite';
import { useSubmitSuite } from '../../client/use-submit-suite';
import { useSuite } from '../../client/use-suite';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';
import { FormulaText } from '../ui/formula-text';
import { SkText } from '../ui/sk-text';
import { TitledPanel } from '../ui/titled-panel';
import { IssueList } from './issue-list';
import { QueryState } from '../ui/query-state';
import { ReferenceTableUpload } from './reference-table-upload';
import { SuiteFacts } from './suite-facts';
import { SuitePreview } from './suite-preview';
import { SuiteStatusLabel } from './suite-status-label';
import { VersionHistory } from './version-history';

function LinkButton({ href, label }: { href: Href; label: string }) {
  return (
    <Link href={href} asChild>
      <Pressable accessibilityRole="link" accessibilityLabel={label} style={StyleSheet.flatten(styles.linkButton)}>
        <SkText variant="label">{label}</SkText>
      </Pressable>
    </Link>
  );
}

/** One suite: what a version checks, its picture, its history, and what the signed-in person may do with it. */
export function SuiteDetail({ slug }: { slug: string }) {
  const suite = useSuite(slug);
  const { data: me } = useMe();
  const submit = useSubmitSuite();
  const retire = useRetireSuite();
  const wide = useWindowDimensions().width >= theme.wide;
  const [chosen, setChosen] = useState<number | null>(null);

  if (suite.isPending) return <QueryState state="loading" />;
  if (suite.isError)
    return <QueryState state="error" message={suite.error.message} onRetry={() => void suite.refetch()} />;
  const versions = suite.data;
  const latest = versions[0];
  if (!latest || !me) return <QueryState state="empty" message="This suite has no versions." />;
  const shown = versions.find((v) => v.version === chosen) ?? latest;
  const body = shown.body;
  const mine = latest.author.id === me.id || me.role === 'admin';
  const openDraft = latest.status === 'draft' || latest.status === 'changes-requested';
  const approved = versions.find((v) => v.status === 'approved');

  const actions = (
    <View style={styles.actions}>
      {openDraft && mine ? <LinkButton href={`/suites/${slug}/edit`} label="Edit draft" /> : null}
      {latest.status === 'approved' || latest.status === 'retired' ? (
        <LinkButton href={`/suites/${slug}/edit`} label={`Edit as version ${latest.version + 1}`} />
      ) : null}
      {openDraft && mine ? (
        <ActionButton
          label={`Submit version ${latest.version} for review`}
          onPress={() => submit.mutate(slug)}
          busy={submit.isPending}
        />
      ) : null}
      {latest.status === 'submitted' && (me.role === 'reviewer' || me.role === 'admin') ? (
        <LinkButton href={`/review/${slug}`} label="Review this version" />
      ) : null}
      {shown.status === 'approved' && me.role !== 'contributor' ? (
        <ActionButton
          label={`Retire version ${shown.version}`}
          tone="quiet"
          onPress={() => retire.mutate({ slug, version: shown.version })}
          busy={retire.isPending}
        />
      ) : null}
    </View>
  );

  const main = (
    <View style={styles.column}>
      <View style={styles.head}>
        <SuiteStatusLabel status={shown.status} version={shown.version} />
        <SkText variant="mono" tone="inkSoft">
          {slug}
        </SkText>
      </View>
      <SkText variant="caption">
        {approved
          ? `Plans use version ${approved.version} (approved).`
          : 'No approved version yet: plans do not run this suite.'}{' '}
        {shown.version !== latest.version ? `Showing version ${shown.version}; the latest is ${latest.version}.` : ''}
      </SkText>
      {body.story ? (
        <SkText variant="body" style={styles.story}>
          <FormulaText text={body.story} size={theme.size.body} />
        </SkText>
      ) : null}
      {actions}
      <IssueList error={submit.error ?? retire.error} />
      <TitledPanel
        title="Plane picture"
        lead="Paths, cuts and branch points of this version, as the runner samples them."
      >
        <SuitePreview
          body={body}
          label={`Plane picture of ${body.title}`}
          testID="suite-picture"
          height={wide ? 380 : 300}
        />
      </TitledPanel>
      <TitledPanel title="What this version checks">
        <SuiteFacts suite={body} />
      </TitledPanel>
    </View>
  );
  const side = (
    <View style={styles.column}>
      <TitledPanel title="Version history">
        <VersionHistory versions={versions} selected={shown.version} onSelect={setChosen} />
      </TitledPanel>
      <TitledPanel
        title="Reference table"
        lead="Check values computed elsewhere against Sheetkeeper's reference for the latest version."
      >
        <ReferenceTableUpload slug={slug} />
      </TitledPanel>
    </View>
  );
  return wide ? (
    <View style={styles.wide}>
      <View style={styles.mainCol}>{main}</View>
      <View style={styles.sideCol}>{side}</View>
    </View>
  ) : (
    <View style={styles.column}>
      {main}
      {side}
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flexDirection: 'row', gap: theme.space(4), alignItems: 'flex-start' },
  mainCol: { flex: 3, minWidth: 0 },
  sideCol: { flex: 2, minWidth: 0 },
  column: { gap: theme.space(4) },
  head: { flexDirection: 'row', alignItems: 'center', gap: theme.space(3), flexWrap: 'wrap' },
  story: { lineHeight: 24 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
  linkButton: {
    minHeight: theme.touch,
    paddingHorizontal: theme.space(5),
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.rule,
    justifyContent: 'center',
    backgroundColor: theme.color.panel,
  },
});
