import { Redirect, Slot } from 'expo-router';
import { View } from 'react-native';
import { useMe } from '../../client/use-me';
import { AppFrame } from '../../components/ui/app-frame';
import { QueryState } from '../../components/ui/query-state';
import { theme } from '../../constants/theme';

/** The auth guard: signed-out visitors go to sign-in; everyone else gets the frame. */
export default function SignedInLayout() {
  const me = useMe();
  if (me.isPending) {
    return (
      <View style={{ flex: 1, backgroundColor: theme.color.paper, padding: theme.space(6) }}>
        <QueryState state="loading" />
      </View>
    );
  }
  if (me.isError) {
    return (
      <View style={{ flex: 1, backgroundColor: theme.color.paper, padding: theme.space(6) }}>
        <QueryState state="error" message={me.error.message} onRetry={() => void me.refetch()} />
      </View>
    );
  }
  if (!me.data) return <Redirect href="/sign-in" />;
  return (
    <AppFrame user={me.data}>
      <Slot />
    </AppFrame>
  );
}
