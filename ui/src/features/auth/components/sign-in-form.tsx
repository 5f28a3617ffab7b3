import { Alert, Button, PasswordInput, Stack, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { IconAlertOctagon, IconClockPause } from '@tabler/icons-react';
import { signInSchema, type Session, type SignInInput } from '@holdfast/shared';
import { ApiRequestError, errorMessage } from '../../../lib/api-error';
import { useSignIn } from '../api/sign-in';

function serverProblem(error: unknown): { title: string; message: string; throttled: boolean } {
  if (error instanceof ApiRequestError && error.status === 429)
    return {
      title: 'Too many sign-in attempts',
      message:
        'Sign-in is paused for this address for a short while. Wait a minute, then try again.',
      throttled: true,
    };
  if (error instanceof ApiRequestError && error.status === 401)
    return { title: 'Not signed in', message: error.message, throttled: false };
  return { title: 'Sign-in failed', message: errorMessage(error), throttled: false };
}

export function SignInForm({ onSuccess }: { onSuccess?: (session: Session) => void }) {
  const form = useForm<SignInInput>({
    mode: 'uncontrolled',
    initialValues: { email: '', password: '' },
    validate: schemaResolver(signInSchema, { sync: true }),
    validateInputOnBlur: true,
  });
  const signIn = useSignIn({ onSuccess });

  const submit = form.onSubmit((values) => {
    signIn.mutate(signInSchema.parse(values), {
      onError: (error) => {
        if (error instanceof ApiRequestError && error.fields.length > 0)
          form.setErrors(error.fieldErrors());
      },
    });
  });

  const problem = signIn.isError ? serverProblem(signIn.error) : null;

  return (
    <form onSubmit={submit} noValidate aria-label="Sign in">
      <Stack gap="md">
        {problem ? (
          <Alert
            color={problem.throttled ? 'amber' : 'fail'}
            variant="light"
            title={problem.title}
            icon={
              problem.throttled ? <IconClockPause aria-hidden /> : <IconAlertOctagon aria-hidden />
            }
            role="alert"
          >
            {problem.message}
          </Alert>
        ) : null}
        <TextInput
          label="E-mail"
          type="email"
          autoComplete="username"
          required
          data-autofocus
          key={form.key('email')}
          {...form.getInputProps('email')}
        />
        <PasswordInput
          label="Password"
          autoComplete="current-password"
          required
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <Button type="submit" loading={signIn.isPending} fullWidth mt="xs">
          Sign in
        </Button>
      </Stack>
    </form>
  );
}
