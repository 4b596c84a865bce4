import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { useMe } from '../../client/use-me';
import { CiExample } from '../../components/settings/ci-example';
import { NewTokenForm } from '../../components/settings/new-token-form';
import { ScreenBody } from '../../components/ui/screen-body';
import { SubscriptionList } from '../../components/settings/subscription-list';
import { TitledPanel } from '../../components/ui/titled-panel';
import { TokenList } from '../../components/settings/token-list';
import { theme } from '../../constants/theme';

export default function SettingsScreen() {
  const { data: me } = useMe();
  const wide = useWindowDimensions().width >= theme.wide;
  if (!me) return null;
  return (
    <ScreenBody title="Settings" lead={`Your mail and your API tokens, ${me.displayName}.`}>
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={[styles.column, wide && styles.half]}>
          <TitledPanel
            title="Regression mail"
            lead="Mail me when a point that passed in a plan's previous run fails now on one of these libraries (accepted deviations excepted). Plans can also name recipients."
          >
            <SubscriptionList />
          </TitledPanel>
        </View>
        <View style={[styles.column, wide && styles.half]}>
          <TitledPanel
            title="API tokens"
            lead="For CI jobs and scripts: a token signs a request in as you, for that request only."
          >
            <NewTokenForm />
            <TokenList />
          </TitledPanel>
          <TitledPanel title="Use it in CI">
            <CiExample role={me.role} />
          </TitledPanel>
        </View>
      </View>
    </ScreenBody>
  );
}

const styles = StyleSheet.create({
  columns: { gap: theme.space(4) },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { gap: theme.space(4) },
  half: { flex: 1, minWidth: 0 },
});
