import { describe, expect, it } from 'vitest';
import { cleanup, screen } from '@testing-library/react';
import type { Register, User } from '@holdfast/shared';
import {
  inForceSheet,
  makeRegister,
  registerPositionId,
  testUsers,
} from '../../../testing/fixtures';
import { mockFetch } from '../../../testing/mock-fetch';
import { renderRoutes } from '../../../testing/render';
import { Component as EquipmentPage } from './equipment';

const empty: Register = { sites: [] };
const revisionId = '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d';

function renderAs(user: User, register = empty) {
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

  it('offers "Record field work" to those who may record it, and to nobody else', async () => {
    const register = makeRegister([inForceSheet(revisionId, 'XS-0001', 'hoist-shoe-brake')]);
    const name = 'Record field work on MH-B1 against XS-0001 rev. B';
    for (const user of [testUsers.technician, testUsers.engineer, testUsers.checker]) {
      renderAs(user, register);
      expect(await screen.findByRole('link', { name })).toHaveAttribute(
        'href',
        `/field-records/new/${revisionId}`,
      );
      cleanup();
    }
    for (const user of [testUsers.viewer, testUsers.admin]) {
      renderAs(user, register);
      expect(await screen.findByText('MH-B1')).toBeInTheDocument();
      expect(screen.queryByRole('link', { name })).toBeNull();
      cleanup();
    }
  });

  it('offers "Start a sheet" on a position with no sheet to those who may author one', async () => {
    const name = 'Start a sheet for MH-B1';
    for (const user of [testUsers.engineer, testUsers.checker]) {
      renderAs(user, makeRegister([]));
      expect(await screen.findByRole('link', { name })).toHaveAttribute(
        'href',
        `/sheets?new=${registerPositionId}`,
      );
      cleanup();
    }
    for (const user of [testUsers.viewer, testUsers.technician, testUsers.admin]) {
      renderAs(user, makeRegister([]));
      expect(await screen.findByText('None approved')).toBeInTheDocument();
      expect(screen.queryByRole('link', { name })).toBeNull();
      cleanup();
    }
    // A sheet in force, or one already open, is where work goes on: no second start offered.
    renderAs(
      testUsers.engineer,
      makeRegister([inForceSheet(revisionId, 'XS-0001', 'hoist-shoe-brake')]),
    );
    expect(await screen.findByText('MH-B1')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name })).toBeNull();
  });
});
