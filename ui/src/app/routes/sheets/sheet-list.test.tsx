import { describe, expect, it } from 'vitest';
import { act, cleanup, screen, waitFor, within } from '@testing-library/react';
import type { Register, User } from '@holdfast/shared';
import { makeRegister, registerPositionId, testUsers } from '../../../testing/fixtures';
import { mockFetch } from '../../../testing/mock-fetch';
import { renderRoutes } from '../../../testing/render';
import { Component as SheetList } from './sheet-list';

function renderAt(route: string, register: Register, user: User = testUsers.engineer) {
  const mock = mockFetch({
    'GET /api/register': { body: register },
    'GET /api/sheets': { body: { items: [], total: 0, page: 1, pageSize: 25 } },
  });
  renderRoutes([{ path: '/sheets', Component: SheetList }], { user, route });
  // Until the register has arrived no dialog can open: wait for it, then let the page render.
  return async () => {
    await waitFor(() => expect(mock.callsTo('GET /api/register')).toHaveLength(1));
    await act(() => new Promise((r) => setTimeout(r, 50)));
  };
}

describe('sheet list: starting a sheet from the equipment page', () => {
  it('opens the new-sheet dialog on the position, with the sheet type its motion suggests', async () => {
    renderAt(`/sheets?new=${registerPositionId}`, makeRegister([]));
    const dialog = await screen.findByRole('dialog', { name: 'New calculation sheet' });
    expect(await within(dialog).findByDisplayValue('MH-B1 — Main hoist brake')).toBeVisible();
    expect(within(dialog).getByDisplayValue('Shoe brake on a hoist')).toBeVisible();
  });

  it('suggests the travel sheet for a trolley position', async () => {
    const register = makeRegister([]);
    register.sites[0]!.machines[0]!.positions[0]!.motion = 'trolley';
    renderAt(`/sheets?new=${registerPositionId}`, register);
    const dialog = await screen.findByRole('dialog', { name: 'New calculation sheet' });
    expect(await within(dialog).findByDisplayValue('Shoe brake on a travel drive')).toBeVisible();
  });

  it('opens nothing for a viewer or for an unknown position, once the register is there', async () => {
    // The same wait shows the dialog to an engineer, so the wait is long enough to see one.
    let settle = renderAt(`/sheets?new=${registerPositionId}`, makeRegister([]));
    await settle();
    expect(screen.getByRole('dialog', { name: 'New calculation sheet' })).toBeVisible();
    cleanup();
    settle = renderAt(`/sheets?new=${registerPositionId}`, makeRegister([]), testUsers.viewer);
    await settle();
    expect(screen.getByRole('heading', { name: 'Sheets' })).toBeInTheDocument();
    expect(screen.queryByRole('dialog')).toBeNull();
    cleanup();
    settle = renderAt('/sheets?new=00000000-0000-4000-8000-000000000000', makeRegister([]));
    await settle();
    expect(screen.queryByRole('dialog')).toBeNull();
  });
});

describe('sheet list: equipment filter', () => {
  it('names the site of each machine while no site is chosen, and not once one is', async () => {
    const register = makeRegister([]);
    const first = register.sites[0]!;
    register.sites.push({
      ...first,
      id: '7a8b9c0d-1e2f-4a3b-8c4d-5e6f7a8b9c0d',
      code: 'YS',
      machines: first.machines.map((m) => ({ ...m, id: '8b9c0d1e-2f3a-4b4c-9d5e-6f7a8b9c0d1e' })),
    });
    const settle = renderAt('/sheets', register);
    await settle();
    const tag = `${first.machines[0]!.tag} — ${first.machines[0]!.name}`;
    screen.getByRole('combobox', { name: 'Equipment' }).click();
    expect(
      await screen.findByRole('option', { name: `${first.code} · ${tag}` }),
    ).toBeInTheDocument();
    expect(screen.getByRole('option', { name: `YS · ${tag}` })).toBeInTheDocument();
    cleanup();
    const one = renderAt(`/sheets?siteId=${first.id}`, register);
    await one();
    screen.getByRole('combobox', { name: 'Equipment' }).click();
    expect(await screen.findByRole('option', { name: tag })).toBeInTheDocument();
  });
});

describe('sheet list: what each role is offered', () => {
  it('tells engineers they can start a sheet and lets them pick out their own', async () => {
    await renderAt('/sheets', makeRegister([]))();
    expect(screen.getByText(/start a new one/)).toBeInTheDocument();
    expect(screen.getByText('Owner')).toBeInTheDocument();
  });

  it('offers fitters and viewers neither: they start no sheets and own none', async () => {
    for (const user of [testUsers.technician, testUsers.viewer]) {
      await renderAt('/sheets', makeRegister([]), user)();
      expect(screen.getByText(/Filter and sort to find one/)).toBeInTheDocument();
      expect(screen.queryByText(/start a new one/)).toBeNull();
      expect(screen.queryByText('Owner')).toBeNull();
      expect(screen.queryByRole('radio', { name: 'Me' })).toBeNull();
      cleanup();
    }
  });
});
