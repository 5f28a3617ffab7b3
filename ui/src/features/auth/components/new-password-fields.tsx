import { PasswordInput, Text } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';

export interface NewPasswordValues {
  newPassword: string;
  repeat: string;
}

/** Client-side checks; the server also refuses common and guessable passwords. */
export function validateNewPassword(values: NewPasswordValues) {
  return {
    newPassword:
      values.newPassword.length < 12
        ? 'At least 12 characters'
        : values.newPassword.length > 200
          ? 'At most 200 characters'
          : null,
    repeat: values.repeat !== values.newPassword ? 'The two entries differ' : null,
  };
}

/** "New password" and "Repeat it", with the rule in words. */
export function NewPasswordFields<T extends NewPasswordValues>({
  form,
}: {
  form: UseFormReturnType<T>;
}) {
  return (
    <>
      <PasswordInput
        label="New password"
        autoComplete="new-password"
        required
        {...form.getInputProps('newPassword')}
      />
      <PasswordInput
        label="Repeat the new password"
        autoComplete="new-password"
        required
        {...form.getInputProps('repeat')}
      />
      <Text size="xs" c="dimmed">
        At least 12 characters and hard to guess: common passwords, keyboard rows, dates and your
        own name are refused. A few unrelated words make a good one.
      </Text>
    </>
  );
}
