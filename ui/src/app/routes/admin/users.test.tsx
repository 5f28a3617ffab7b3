import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/react';
import type { User } from '@holdfast/shared';
import { RouteErrorBoundary } from '../../../components/errors/route-error-boundary';
import { makeUser, testUsers } from '../../../testing/fixtures';
import { jsonError, mockFetch, type MockRequest } from '../../../testing/mock-fetch';
import { createTestQueryClient, renderRoutes } from '../../../testing/render';
import { clientLoader, Component as UsersPage } from './users';

const erin = testUsers.engineer;
const sam = testUsers.admin;

function renderPage(as: User = sam, users: User[] = [sam, erin]) {
  const list = users.map((u) => ({ ...u }));
  const mock = mockFetch({
    'GET /api/users': () => ({ body: { items: list } }),
    [`PATCH /api/users/${erin.id}`]: (req: MockRequest) => {
      const i = list.findIndex((u) => u.id === erin.id);
      list[i] = { ...list[i]!, ...(req.body as Partial<User>) };
      return { body: list[i] };
    },
  });
  const queryClient = createTestQueryClient();
  const view = renderRoutes(
    [
      {
        path: '/admin/users',
        Component: UsersPage,
        loader: clientLoader(queryClient),
        ErrorBoundary: RouteErrorBoundary,
      },
    ],
    { user: as, route: '/admin/users', queryClient },
  );
  return { ...view, mock };
}

async function row(name: string) {
  const cell = await screen.findByText(name);
  return cell.closest('tr')!;
}

describe('admin users page', () => {
  it('lists users with role and status, and protects the admin’s own row', async () => {
    renderPage();
    const erinRow = await row('Erin Vale');
    expect(within(erinRow).getByText('engineer@holdfast.test')).toBeInTheDocument();
    expect(within(erinRow).getByText('Active')).toBeInTheDocument();
    expect(within(erinRow).getByRole('button', { name: 'Deactivate Erin Vale' })).toBeEnabled();

    const samRow = await row('Sam Ortiz');
    expect(within(samRow).queryByRole('button', { name: /deactivate/i })).toBeNull();
    expect(screen.getByRole('combobox', { name: 'Role of Sam Ortiz' })).toBeDisabled();
  });

  it('changes a role through PATCH and shows the answer', async () => {
    const { user, mock } = renderPage();
    await user.click(await screen.findByRole('combobox', { name: 'Role of Erin Vale' }));
    await user.click(await screen.findByRole('option', { name: 'Checker' }));

    await waitFor(() => expect(mock.callsTo(`PATCH /api/users/${erin.id}`)).toHaveLength(1));
    expect(mock.callsTo(`PATCH /api/users/${erin.id}`)[0]?.body).toEqual({ role: 'checker' });
    await waitFor(() =>
      expect(screen.getByRole('combobox', { name: 'Role of Erin Vale' })).toHaveValue('Checker'),
    );
  });

  it('deactivates and reactivates a user', async () => {
    const { user, mock } = renderPage();
    await user.click(await screen.findByRole('button', { name: 'Deactivate Erin Vale' }));
    const erinRow = await row('Erin Vale');
    expect(await within(erinRow).findByText('Deactivated')).toBeInTheDocument();
    expect(mock.callsTo(`PATCH /api/users/${erin.id}`)[0]?.body).toEqual({ active: false });

    await user.click(within(erinRow).getByRole('button', { name: 'Reactivate Erin Vale' }));
    expect(await within(erinRow).findByText('Active')).toBeInTheDocument();
  });

  it('shows why a change was refused', async () => {
    const { user } = renderPage();
    mockFetch({
      'GET /api/users': { body: { items: [sam, erin] } },
      [`PATCH /api/users/${erin.id}`]: jsonError(409, 'conflict', 'Erin Vale owns open drafts.'),
    });
    await user.click(await screen.findByRole('button', { name: 'Deactivate Erin Vale' }));
    expect(await screen.findByText('Erin Vale owns open drafts.')).toBeInTheDocument();
  });

  it('refuses non-admins before asking the server', async () => {
    const { mock } = renderPage(erin);
    expect(await screen.findByRole('heading', { name: 'Not allowed' })).toBeInTheDocument();
    expect(mock.callsTo('GET /api/users')).toHaveLength(0);
  });
});

describe('new user dialog', () => {
  it('shows the shared schema’s errors per field and sends nothing', async () => {
    const { user, mock } = renderPage();
    await user.click(await screen.findByRole('button', { name: 'New user' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText(/^initials/i), 'e1');
    await user.type(within(dialog).getByLabelText(/first password/i), 'short');
    await user.click(within(dialog).getByRole('button', { name: 'Create user' }));

    expect(await within(dialog).findByText('not a valid e-mail address')).toBeInTheDocument();
    expect(within(dialog).getByText('2 to 4 capital letters')).toBeInTheDocument();
    expect(within(dialog).getByText('at least 12 characters')).toBeInTheDocument();
    expect(mock.callsTo('POST /api/users')).toHaveLength(0);
  });

  it('suggests initials, creates the user and shows server conflicts on the e-mail field', async () => {
    const { user } = renderPage();
    let attempts = 0;
    const created = makeUser({
      id: '3f2e1d0c-9b8a-4765-8432-10fedcba9876',
      email: 'new.engineer@holdfast.test',
      displayName: 'Noor Haddad',
      initials: 'NH',
    });
    const mock = mockFetch({
      'GET /api/users': () => ({
        body: { items: attempts > 1 ? [sam, erin, created] : [sam, erin] },
      }),
      'POST /api/users': () => {
        attempts += 1;
        return attempts === 1
          ? jsonError(409, 'conflict', 'A user with this e-mail already exists.')
          : { status: 201, body: created };
      },
    });
    await user.click(await screen.findByRole('button', { name: 'New user' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText(/^e-mail/i), 'New.Engineer@holdfast.test');
    await user.type(within(dialog).getByLabelText(/display name/i), 'Noor Haddad');
    await user.tab();
    expect(within(dialog).getByLabelText(/^initials/i)).toHaveValue('NH');
    await user.type(within(dialog).getByLabelText(/first password/i), 'a-long-first-password');
    await user.click(within(dialog).getByRole('button', { name: 'Create user' }));

    expect(
      await within(dialog).findByText('A user with this e-mail already exists.'),
    ).toBeInTheDocument();
    expect(within(dialog).getByLabelText(/^e-mail/i)).toHaveAttribute('aria-invalid', 'true');

    await user.click(within(dialog).getByRole('button', { name: 'Create user' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(mock.callsTo('POST /api/users')[1]?.body).toMatchObject({
      email: 'new.engineer@holdfast.test',
      displayName: 'Noor Haddad',
      initials: 'NH',
      role: 'engineer',
    });
    expect(await screen.findByText('Noor Haddad')).toBeInTheDocument();
  });
});
