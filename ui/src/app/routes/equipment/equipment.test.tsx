import { describe, expect, it } from 'vitest';
import { cleanup, screen } from '@testing-library/react';
import type { Register, User } from '@holdfast/shared';
import { testUsers } from '../../../testing/fixtures';
import { mockFetch } from '../../../testing/mock-fetch';
import { renderRoutes } from '../../../testing/render';
import { Component as EquipmentPage } from './equipment';

const register: Register = { sites: [] };

function renderAs(user: User) {
  mockFetch({ 'GET /api/register': { body: register } });
  renderRoutes([{ path: '/equipment', Component: EquipmentPage }], {
    user,
    route: '/equipment',
  });
}

describe('equipment page', () => {
  it('offers register changes to those the server lets make them', async () => {
    for (const user of [testUsers.engineer, testUsers.checker, testUsers.admin]) {
      renderAs(user);
      expect(await screen.findByRole('button', { name: 'Add site' })).toBeInTheDocument();
      cleanup();
    }
  });

  it('offers none to viewers and fitters', async () => {
    for (const user of [testUsers.viewer, testUsers.technician]) {
      renderAs(user);
      expect(await screen.findByRole('heading', { name: 'Equipment' })).toBeInTheDocument();
      expect(screen.queryByRole('button', { name: 'Add site' })).toBeNull();
      cleanup();
    }
  });
});
