import { Alert, Button, Group, PasswordInput, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { ApiRequestError, errorMessage } from '../../../lib/api-error';
import { useChangePassword } from '../api/change-password';
import {
  NewPasswordFields,
  validateNewPassword,
  type NewPasswordValues,
} from './new-password-fields';

interface Values extends NewPasswordValues {
  currentPassword: string;
}

/** Own password change; on success every other session of the user has ended. */
export function ChangePasswordForm() {
  const form = useForm<Values>({
    mode: 'controlled',
    initialValues: { currentPassword: '', newPassword: '', repeat: '' },
    validate: (values) => ({
      currentPassword: values.currentPassword ? null : 'Required',
      ...validateNewPassword(values),
    }),
  });
  const change = useChangePassword();

  const submit = form.onSubmit(({ currentPassword, newPassword }) =>
    change.mutate(
      { currentPassword, newPassword },
      {
        onSuccess: () => {
          form.reset();
          notifications.show({
            color: 'pass',
            title: 'Password changed',
            message: 'You stay signed in here; other devices must sign in again.',
          });
        },
        onError: (error) => {
          if (error instanceof ApiRequestError && error.fields.length > 0)
            form.setErrors(error.fieldErrors());
        },
      },
    ),
  );

  const unplaced =
    change.error instanceof ApiRequestError && change.error.fields.length > 0 ? null : change.error;

  return (
    <form onSubmit={submit} noValidate aria-label="Change password">
      <Stack gap="sm" maw={420}>
        {unplaced ? (
          <Alert color="fail" variant="light" role="alert" title="Not changed">
            {errorMessage(unplaced)}
          </Alert>
        ) : null}
        <PasswordInput
          label="Current password"
          autoComplete="current-password"
          required
          {...form.getInputProps('currentPassword')}
        />
        <NewPasswordFields form={form} />
        <Group>
          <Button type="submit" loading={change.isPending}>
            Change password
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
