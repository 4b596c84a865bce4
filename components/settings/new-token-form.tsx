import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { serverFieldErrors } from '../../client/server-field-errors';
import { useCreateToken } from '../../client/use-create-token';
import { theme } from '../../constants/theme';
import { tokenBody } from '../../shared/schemas/token-body';
import { ActionButton } from '../ui/action-button';
import { NewTokenSecret } from './new-token-secret';
import { TextField } from '../ui/text-field';
import { FailureAlert } from '../ui/failure-alert';

/** Makes an API token from a name, then shows its secret once. */
export function NewTokenForm() {
  const [name, setName] = useState('');
  const [error, setError] = useState<string | undefined>();
  const [made, setMade] = useState<{ name: string; secret: string } | null>(null);
  const create = useCreateToken();
  const serverError = serverFieldErrors(create.error).name;
  const other =
    create.error instanceof ApiRequestError
      ? create.error.body.kind === 'invalid-input'
        ? null
        : create.error.body.message
      : create.error
        ? 'The server could not be reached; no token was made.'
        : null;

  const submit = () => {
    const checked = tokenBody.safeParse({ name });
    if (!checked.success) return setError(checked.error.issues[0]?.message);
    setError(undefined);
    create.mutate(checked.data.name, {
      onSuccess: ({ token, secret }) => {
        setMade({ name: token.name, secret });
        setName('');
      },
    });
  };

  if (made) return <NewTokenSecret name={made.name} secret={made.secret} onDismiss={() => setMade(null)} />;
  return (
    <View style={styles.form}>
      <TextField
        label="Token name"
        value={name}
        onChangeText={(text) => {
          setName(text);
          if (error) setError(tokenBody.safeParse({ name: text }).error?.issues[0]?.message);
        }}
        error={error ?? serverError}
        placeholder="where it is used, e.g. complex.js CI"
        onSubmitEditing={submit}
        testID="token-name"
      />
      {other ? <FailureAlert message={other} /> : null}
      <ActionButton label="Make token" onPress={submit} busy={create.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: theme.space(3) },
});
