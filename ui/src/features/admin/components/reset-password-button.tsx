import { Button } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import type { User } from '@holdfast/shared';
import { errorMessage } from '../../../lib/api-error';
import { useResetPassword } from '../api/reset-password';

/**
 * Two clicks: "Reset password", then "Confirm reset". The user's password stops working at
 * once and a one-time link goes to their e-mail, so a stray click must not do it.
 */
export function ResetPasswordButton({ user }: { user: User }) {
  const [armed, setArmed] = useState(false);
  const reset = useResetPassword();
  if (!user.active) return null;
  return (
    <Button
      size="xs"
      variant={armed ? 'filled' : 'default'}
      color={armed ? 'fail' : undefined}
      loading={reset.isPending}
      onBlur={() => setArmed(false)}
      aria-label={`${armed ? 'Confirm password reset for' : 'Reset password of'} ${user.displayName}`}
      onClick={() => {
        if (!armed) return setArmed(true);
        setArmed(false);
        reset.mutate(user.id, {
          onSuccess: (answer) =>
            notifications.show({
              color: 'steel',
              title: 'Password reset',
              message: `A one-time link is on its way to ${answer.sentTo}.`,
            }),
          onError: (error) =>
            notifications.show({
              color: 'fail',
              title: `${user.displayName}: not reset`,
              message: errorMessage(error),
            }),
        });
      }}
    >
      {armed ? 'Confirm reset' : 'Reset password'}
    </Button>
  );
}
