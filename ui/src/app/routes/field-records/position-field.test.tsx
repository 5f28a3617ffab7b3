import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen } from '@testing-library/react';
import type { PositionFieldState, User } from '@holdfast/shared';
import {
  inForceSheet as sheet,
  makeRegister,
  registerPositionId as positionId,
  testUsers,
  type InForce,
} from '../../../testing/fixtures';
import { mockFetch } from '../../../testing/mock-fetch';
import { renderRoutes } from '../../../testing/render';
import { Component as PositionField } from './position-field';

const brakeRev = '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d';
const springsRev = '2b3c4d5e-6f70-4b8c-9d0e-1f2a3b4c5d6e';

const state: PositionFieldState = {
  positionId,
  setTo: null,
  lastInspected: null,
  interval: null,
  nextDue: null,
  openFindings: [],
};

function renderAs(user: User, inForce: InForce[]) {
  mockFetch({
    'GET /api/register': { body: makeRegister(inForce) },
    [`GET /api/register/positions/${positionId}/field-records`]: { body: { items: [] } },
    [`GET /api/register/positions/${positionId}/field-state`]: { body: state },
  });
  renderRoutes([{ path: '/positions/:positionId/field', Component: PositionField }], {
    user,
    route: `/positions/${positionId}/field`,
  });
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('a position’s field page', () => {
  it('lets a fitter start a record against each approved sheet in force', async () => {
    renderAs(testUsers.technician, [
      sheet(brakeRev, 'XS-0001', 'hoist-shoe-brake'),
      sheet(springsRev, 'XS-0002', 'disc-spring-stack'),
    ]);
    const brake = await screen.findByRole('link', {
      name: 'Record field work on MH-B1 against XS-0001 rev. B',
    });
    expect(brake).toHaveAttribute('href', `/field-records/new/${brakeRev}`);
    expect(
      screen.getByRole('link', { name: 'Record field work on MH-B1 against XS-0002 rev. B' }),
    ).toHaveAttribute('href', `/field-records/new/${springsRev}`);
  });

  it('says so when nothing is approved to set the brake to', async () => {
    renderAs(testUsers.engineer, []);
    expect(await screen.findByText(/No approved sheet is in force here/)).toBeInTheDocument();
  });

  it('offers viewers no record to start', async () => {
    renderAs(testUsers.viewer, [sheet(brakeRev, 'XS-0001', 'hoist-shoe-brake')]);
    expect(await screen.findByText(/Open findings/)).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /Record field work/ })).toBeNull();
  });
});
