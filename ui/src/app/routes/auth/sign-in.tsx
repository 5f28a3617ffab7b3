import { Alert, Paper, Stack, Text, Title } from '@mantine/core';
import { IconInfoCircle } from '@tabler/icons-react';
import { Navigate, useSearchParams } from 'react-router-dom';
import { Wordmark } from '../../../components/brand/wordmark';
import { SignInForm } from '../../../features/auth/components/sign-in-form';
import { OutboxSignInNotice } from '../../../features/field-records/components/outbox-sign-in-notice';
import { useSession } from '../../../lib/session';
import classes from './sign-in.module.css';

/** Only same-site paths: `next` comes from the address bar and must not send anyone elsewhere. */
export function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith('/\\')
    ? next
    : '/';
}

export function Component() {
  const session = useSession();
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));

  if (session.status === 'signed-in') return <Navigate to={next} replace />;

  return (
    <div className={classes.page}>
      <aside className={classes.side}>
        <Wordmark size="lg" />
        <Text className={classes.lead}>
          Calculation sheets for industrial brakes: worked out, checked, approved and printed in one
          place.
        </Text>
      </aside>
      <main className={classes.formSide}>
        <Paper className={classes.card} p="xl">
          <Stack gap="lg">
            <Title order={1} className={classes.title}>
              Sign in
            </Title>
            {session.endReason === 'expired' ? (
              <Alert color="steel" variant="light" icon={<IconInfoCircle aria-hidden />}>
                Your session has ended. Sign in again to carry on.
              </Alert>
            ) : null}
            <OutboxSignInNotice returnsTo={next} />
            <SignInForm />
          </Stack>
        </Paper>
      </main>
    </div>
  );
}
