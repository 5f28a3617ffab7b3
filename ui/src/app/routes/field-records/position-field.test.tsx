import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen } from '@testing-library/react';
import type { FieldRecord, PositionFieldState, User } from '@holdfast/shared';
import {
  inForceSheet as sheet,
  makeRegister,
  registerPositionId as positionId,
  springTarget,
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

const fitter = { id: testUsers.technician.id, displayName: 'Teo Marsh', initials: 'TM' };
const signedRecord: FieldRecord = {
  id: '6f708192-a3b4-4cd5-8e6f-708192a3b4c5',
  positionId,
  positionTag: 'MH-B1',
  machineTag: 'CR-02',
  siteCode: 'XS',
  revisionId: brakeRev,
  sheetId: '5e6f7081-92a3-4ebf-8031-4c5d6e7f8091',
  documentNumber: 'XS-0001',
  revisionLabel: 'B',
  kind: 'periodic-inspection',
  status: 'signed',
  performedAt: '2026-11-30T09:00:00.000Z',
  meterHours: null,
  measurements: [
    {
      settingKey: 'springLength',
      asFound: 0.1243,
      asLeft: 0.124,
      reason: '',
      label: 'Main spring length as set',
      target: 0.124,
      unit: 'mm',
      dimension: 'length',
      tolerance: springTarget(0.124).tolerance,
      asFoundVerdict: null,
      asLeftVerdict: {
        status: 'in',
        deviationSI: 0,
        lowerSI: 0.1235,
        upperSI: 0.1245,
        display: { unit: 'mm', label: 'mm', deviation: 0, lower: 123.5, upper: 124.5 },
      },
    },
  ],
  checks: [],
  findings: '',
  outOfTolerance: false,
  flags: { superseded: false, underReview: false },
  createdBy: fitter,
  createdAt: '2026-11-30T09:00:00.000Z',
  updatedAt: '2026-11-30T09:30:00.000Z',
  signed: { by: fitter, at: '2026-11-30T09:30:00.000Z' },
  countersigned: null,
  verificationCode: 'ABCDEFGH23',
};

function renderAs(user: User, inForce: InForce[], records: FieldRecord[] = []) {
  mockFetch({
    'GET /api/register': { body: makeRegister(inForce) },
    [`GET /api/register/positions/${positionId}/field-records`]: {
      body: { positionId, items: records },
    },
    [`GET /api/revisions/${brakeRev}/field-form`]: { status: 404 },
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
      name: 'Record field work: XS-0001 rev. B (shoe brake on a hoist)',
    });
    expect(brake).toHaveAttribute('href', `/field-records/new/${brakeRev}`);
    // The tag alone does not say which crane: the header names the site, machine and position.
    expect(screen.getByRole('heading', { level: 1, name: 'Field records · MH-B1' })).toBeVisible();
    expect(screen.getByText('XS · C-1 Crane 1')).toBeVisible();
    expect(screen.getByText('Main hoist brake')).toBeVisible();
    expect(
      screen.getByRole('link', { name: /^Record field work: XS-0002 rev\. B/ }),
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

  it('lets the plant engineer countersign a fitter’s signed record, its values shown', async () => {
    renderAs(testUsers.viewer, [sheet(brakeRev, 'XS-0001', 'hoist-shoe-brake')], [signedRecord]);
    expect(await screen.findByRole('button', { name: 'Countersign' })).toBeInTheDocument();
    const values = screen.getByRole('table', { name: 'Values measured' });
    expect(values).toHaveTextContent('Main spring length as set');
    expect(values).toHaveTextContent('124.3 mm');
    // The band it is judged by, beside the target.
    expect(values).toHaveTextContent('± 0.5 mm');
    expect(values).toHaveTextContent('within');
    expect(screen.getByRole('button', { name: /Print the record of 2026-11-30/ })).toBeEnabled();
  });

  it('offers no countersignature to the fitter who made and signed the record', async () => {
    renderAs(testUsers.technician, [], [signedRecord]);
    expect(await screen.findByText(/signed by Teo Marsh/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Countersign' })).toBeNull();
  });

  it('lets the fitter sign a record saved earlier and left unsigned, its values shown', async () => {
    const draft: FieldRecord = {
      ...signedRecord,
      status: 'draft',
      signed: null,
      verificationCode: null,
    };
    renderAs(testUsers.technician, [], [draft]);
    const signButton = await screen.findByRole('button', { name: 'Sign the record' });
    expect(screen.getByRole('table', { name: 'Values measured' })).toHaveTextContent('124.3 mm');
    mockFetch({
      [`POST /api/field-records/${draft.id}/sign`]: { body: signedRecord },
      [`GET /api/register/positions/${positionId}/field-records`]: {
        body: { positionId, items: [signedRecord] },
      },
      [`GET /api/register/positions/${positionId}/field-state`]: { body: state },
      'GET /api/register': { body: makeRegister([]) },
    });
    signButton.click();
    expect(await screen.findByText(/signed by Teo Marsh/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Sign the record' })).toBeNull();
  });

  it('offers nobody else the maker’s signature', async () => {
    const draft: FieldRecord = {
      ...signedRecord,
      status: 'draft',
      signed: null,
      verificationCode: null,
    };
    renderAs(testUsers.viewer, [], [draft]);
    expect(await screen.findByText(/Set to XS-0001 rev\. B/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Sign the record' })).toBeNull();
  });
});
