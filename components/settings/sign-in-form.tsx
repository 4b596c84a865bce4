import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { useSignIn } from '../../client/use-sign-in';
import { theme } from '../../constants/theme';
import { signInBody } from '../../shared/schemas/sign-in-body';
import { ActionButton } from '../ui/action-button';
import { SkText } from '../ui/sk-text';
import { TextField } from '../ui/text-field';

type Field = 'email' | 'password';

/** Validates with the same schema as the server; the server's own answer is shown above the button. */
export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [fieldErrors, setFieldErrors] = useState<Partial<Record<Field, string>>>({});
  const [submitted, setSubmitted] = useState(false);
  const signIn = useSignIn();

  const validate = (values: { email: string; password: string }) => {
    const result = signInBody.safeParse(values);
    const errors: Partial<Record<Field, string>> = {};
    if (!result.success) {
      for (const issue of result.error.issues) {
        const field = issue.path[0];
        if ((field === 'email' || field === 'password') && !errors[field]) errors[field] = issue.message;
      }
    }
    setFieldErrors(errors);
    return result;
  };

  const submit = () => {
    setSubmitted(true);
    const result = validate({ email, password });
    if (!result.success) return;
    signIn.mutate(result.data, { onSuccess: onSignedIn });
  };

  const serverError =
    signIn.error instanceof ApiRequestError
      ? signIn.error.body
      : signIn.error
        ? { kind: 'server-error' as const, message: 'The server could not be reached.' }
        : null;
  const serverFieldErrors =
    serverError?.kind === 'invalid-input'
      ? Object.fromEntries(serverError.issues.map((i) => [i.field.replace(/^body\./, ''), i.rule]))
      : {};

  return (
    <View style={styles.form}>
      <TextField
        label="E-mail"
        value={email}
        onChangeText={(text) => {
          setEmail(text);
          if (submitted) validate({ email: text, password });
        }}
        error={fieldErrors.email ?? serverFieldErrors.email}
        autoComplete="email"
        keyboardType="email-address"
        autoCapitalize="none"
        testID="sign-in-email"
      />
      <TextField
        label="Password"
        value={password}
        onChangeText={(text) => {
          setPassword(text);
          if (submitted) validate({ email, password: text });
        }}
        error={fieldErrors.password ?? serverFieldErrors.password}
        secureTextEntry
        autoComplete="current-password"
        onSubmitEditing={submit}
        testID="sign-in-password"
      />
      {serverError && serverError.kind !== 'invalid-input' ? (
        <SkText
          variant="label"
          tone="danger"
          accessibilityRole="alert"
          style={styles.serverError}
          testID="sign-in-server-error"
        >
          × {serverError.message}
        </SkText>
      ) : null}
      <ActionButton label="Sign in" onPress={submit} busy={signIn.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: theme.space(4) },
  serverError: { backgroundColor: theme.color.dangerSoft, padding: theme.space(3), borderRadius: theme.radius },
});
