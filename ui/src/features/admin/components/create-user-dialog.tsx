import { Alert, Group, Modal, PasswordInput, Select, Stack, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { DialogActions } from '../../../components/dialog-actions';
import { notifications } from '@mantine/notifications';
import { createUserSchema, type CreateUserInput } from '@holdfast/shared';
import { ApiRequestError, errorMessage } from '../../../lib/api-error';
import { useCreateUser } from '../api/create-user';
import { roleOptions } from './role-options';

const empty: CreateUserInput = {
  email: '',
  displayName: '',
  initials: '',
  role: 'engineer',
  password: '',
};

/** "Erin Vale" → "EV": a starting point the admin can change. */
export function suggestInitials(name: string): string {
  return name
    .trim()
    .split(/\s+/)
    .filter(Boolean)
    .map((part) => part[0]!.toUpperCase())
    .filter((c) => /[A-Z]/.test(c))
    .slice(0, 4)
    .join('');
}

export function CreateUserDialog({ opened, onClose }: { opened: boolean; onClose: () => void }) {
  const form = useForm<CreateUserInput>({
    mode: 'controlled',
    initialValues: empty,
    validate: schemaResolver(createUserSchema, { sync: true }),
    validateInputOnBlur: true,
  });
  const create = useCreateUser();

  const close = () => {
    form.reset();
    create.reset();
    onClose();
  };

  const submit = form.onSubmit((values) => {
    create.mutate(createUserSchema.parse(values), {
      onSuccess: (user) => {
        notifications.show({ color: 'pass', title: 'User created', message: user.email });
        close();
      },
      onError: (error) => {
        if (!(error instanceof ApiRequestError)) return;
        if (error.fields.length > 0) form.setErrors(error.fieldErrors());
        else if (error.status === 409) form.setFieldError('email', error.message);
      },
    });
  });

  const onNameBlur = () => {
    if (!form.values.initials)
      form.setFieldValue('initials', suggestInitials(form.values.displayName));
  };

  const unplaced =
    create.error instanceof ApiRequestError &&
    (create.error.fields.length > 0 || create.error.status === 409)
      ? null
      : create.error;

  return (
    <Modal opened={opened} onClose={close} title="New user" size="md">
      <form onSubmit={submit} noValidate aria-label="New user">
        <Stack gap="sm">
          {unplaced ? (
            <Alert color="fail" variant="light" role="alert" title="Not created">
              {errorMessage(unplaced)}
            </Alert>
          ) : null}
          <TextInput
            label="E-mail"
            type="email"
            required
            data-autofocus
            {...form.getInputProps('email')}
          />
          <TextInput
            label="Display name"
            required
            {...form.getInputProps('displayName')}
            onBlur={(e) => {
              form.getInputProps('displayName').onBlur?.(e);
              onNameBlur();
            }}
          />
          <Group grow align="flex-start">
            <TextInput
              label="Initials"
              description="Printed on sheets"
              required
              maxLength={4}
              {...form.getInputProps('initials')}
            />
            <Select
              label="Role"
              required
              allowDeselect={false}
              data={roleOptions}
              {...form.getInputProps('role')}
            />
          </Group>
          <PasswordInput
            label="First password"
            description="At least 12 characters; the user should change it."
            required
            autoComplete="new-password"
            {...form.getInputProps('password')}
          />
          <DialogActions
            onCancel={close}
            confirmLabel="Create user"
            pending={create.isPending}
            mt="sm"
          />
        </Stack>
      </form>
    </Modal>
  );
}
