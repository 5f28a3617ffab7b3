import { Alert, Anchor, Button, Paper, Stack, Text, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Wordmark } from '../../../components/brand/wordmark';
import { paths } from '../../../config/paths';
import { useCompletePasswordReset } from '../../../features/auth/api/complete-password-reset';
import {
  NewPasswordFields,
  validateNewPassword,
  type NewPasswordValues,
} from '../../../features/auth/components/new-password-fields';
import { ApiRequestError, errorMessage } from '../../../lib/api-error';
import classes from './sign-in.module.css';

/** The mailed link carries the token after `#`, so it never reaches a server log or Referer. */
export function tokenFromHash(hash: string): string {
  return new URLSearchParams(hash.replace(/^#/, '')).get('token') ?? '';
}

export function Component() {
  const [token] = useState(() => tokenFromHash(window.location.hash));
  const form = useForm<NewPasswordValues>({
    mode: 'controlled',
    initialValues: { newPassword: '', repeat: '' },
    validate: validateNewPassword,
  });
  const reset = useCompletePasswordReset();

  const submit = form.onSubmit(({ newPassword }) =>
    reset.mutate(
      { token, newPassword },
      {
        onError: (error) => {
          if (error instanceof ApiRequestError) {
            const fields = error.fieldErrors();
            if (fields.newPassword) form.setFieldError('newPassword', fields.newPassword);
          }
        },
      },
    ),
  );

  const linkError =
    reset.error instanceof ApiRequestError ? reset.error.fieldErrors().token : undefined;
  const other =
    reset.error && !(reset.error instanceof ApiRequestError && reset.error.fields.length > 0)
      ? errorMessage(reset.error)
      : undefined;

  return (
    <div className={classes.page}>
      <aside className={classes.side}>
        <Wordmark size="lg" />
      </aside>
      <main className={classes.formSide}>
        <Paper className={classes.card} p="xl">
          <Stack gap="lg">
            <Title order={1} className={classes.title}>
              Set a new password
            </Title>
            {reset.isSuccess ? (
              <Alert color="pass" variant="light" role="status" title="Password set">
                <Anchor component={Link} to={paths.signIn.build()}>
                  Sign in with your new password
                </Anchor>
              </Alert>
            ) : !token ? (
              <Alert color="fail" variant="light" role="alert">
                This page needs the link from your reset e-mail. Ask your administrator for a new
                one.
              </Alert>
            ) : (
              <form onSubmit={submit} noValidate aria-label="Set a new password">
                <Stack gap="sm">
                  {linkError || other ? (
                    <Alert color="fail" variant="light" role="alert" title="Not set">
                      {linkError ? `The link: ${linkError}.` : other}
                    </Alert>
                  ) : null}
                  <NewPasswordFields form={form} />
                  <Button type="submit" loading={reset.isPending}>
                    Set password
                  </Button>
                  <Text size="xs" c="dimmed">
                    The link works once and for 24 hours.
                  </Text>
                </Stack>
              </form>
            )}
          </Stack>
        </Paper>
      </main>
    </div>
  );
}
