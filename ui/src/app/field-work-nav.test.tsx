import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import type { RouteObject } from 'react-router-dom';
import type { User } from '@holdfast/shared';
import { testUsers } from '../testing/fixtures';
import { mockFetch } from '../testing/mock-fetch';
import { renderRoutes } from '../testing/render';
import { AppFrame } from './app-frame';
import { requireSession } from './router';
import {
  Component as FieldWork,
  handle as fieldWorkHandle,
} from './routes/field-records/field-work';

const routes: RouteObject[] = [
  {
    Component: AppFrame,
    loader: requireSession,
    children: [
      { index: true, handle: { title: 'Work queue' }, element: <h1>Queue</h1> },
      { path: 'field', handle: fieldWorkHandle, Component: FieldWork },
    ],
  },
];

async function navFor(user: User) {
  renderRoutes(routes, { user, route: '/' });
  await screen.findByRole('heading', { name: 'Queue' });
  return screen.getByRole('navigation', { name: 'Main' });
}

const positionId = '7e6d5c4b-3a29-4180-9f7e-6d5c4b3a2918';

afterEach(() => vi.unstubAllGlobals());

describe('Field work in the side navigation', () => {
  it.each([
    ['technician', testUsers.technician],
    ['engineer', testUsers.engineer],
    ['checker', testUsers.checker],
  ] as const)('is offered to the %s role, which may record field work', async (_role, user) => {
    const nav = await navFor(user);
    expect(within(nav).getByRole('link', { name: 'Field work' })).toHaveAttribute('href', '/field');
  });

  it.each([
    ['viewer', testUsers.viewer],
    ['admin', testUsers.admin],
  ] as const)(
    'is hidden from the %s role, which the server refuses a record',
    async (_role, user) => {
      const nav = await navFor(user);
      expect(within(nav).getByRole('link', { name: 'Work queue' })).toBeInTheDocument();
      expect(within(nav).queryByRole('link', { name: 'Field work' })).toBeNull();
    },
  );

  it('opens the due inspections and open records for a technician', async () => {
    const summary = {
      id: '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f',
      positionId,
      positionTag: 'HB-2',
      machineTag: 'CR-07',
      siteCode: 'NW',
      revisionId: '2d3e4f5a-6b7c-4d8e-9f0a-1b2c3d4e5f60',
      documentNumber: 'BRK-0007',
      revisionLabel: 'B',
      kind: 'periodic-inspection',
      status: 'draft',
      performedAt: '2026-11-30T09:00:00.000Z',
      meterHours: null,
      outOfTolerance: true,
      flags: { superseded: false, underReview: false },
      signed: null,
      countersigned: null,
    };
    const mock = mockFetch({
      'GET /api/field-records/due': {
        body: {
          due: [],
          overdue: [
            {
              positionId,
              positionTag: 'HB-1',
              machineTag: 'CR-04',
              siteCode: 'NW',
              lastInspectedAt: '2026-05-01T00:00:00.000Z',
              nextDue: { date: '2026-11-01T00:00:00.000Z', meterHours: null, overdue: true },
            },
          ],
          awaitingCountersign: [
            {
              recordId: '3e4f5a6b-7c8d-4e9f-8a1b-2c3d4e5f6071',
              positionId,
              positionTag: 'HB-1',
              machineTag: 'CR-05',
              siteCode: 'NW',
              performedAt: '2026-11-28T10:00:00.000Z',
              outOfTolerance: false,
            },
          ],
        },
      },
      'GET /api/field-records': (req) => ({
        body: { items: req.url.searchParams.get('status') === 'draft' ? [summary] : [] },
      }),
    });
    const { user } = renderRoutes(routes, { user: testUsers.technician, route: '/' });
    await screen.findByRole('heading', { name: 'Queue' });
    await user.click(screen.getByRole('link', { name: 'Field work' }));
    expect(await screen.findByRole('heading', { name: 'Field work', level: 1 })).toBeVisible();
    const due = await screen.findByRole('region', { name: 'Field inspections' });
    expect(within(due).getByRole('link', { name: 'NW · CR-04 · HB-1' })).toHaveAttribute(
      'href',
      `/positions/${positionId}/field`,
    );
    expect(due).toHaveTextContent('overdue');
    // Counted like the queue's other cards; the count says when something is overdue.
    expect(within(due).getByLabelText('2 items, 1 overdue')).toHaveTextContent('2');
    expect(within(due).getAllByRole('listitem')).toHaveLength(2);
    // Tags like HB-1 repeat on every crane: each line names the machine and site as well.
    expect(due).toHaveTextContent(
      'NW · CR-05 · HB-1: record of 2026-11-28 awaits your countersignature',
    );
    const drafts = screen.getByRole('region', { name: 'Records not yet signed' });
    expect(
      await within(drafts).findByRole('link', { name: 'NW · CR-07 · HB-2' }),
    ).toBeInTheDocument();
    expect(drafts).toHaveTextContent('Periodic inspection · BRK-0007 rev. B');
    expect(drafts).toHaveTextContent('out of tolerance');
    const signed = screen.getByRole('region', { name: 'Signed, awaiting countersignature' });
    expect(await within(signed).findByText('None.')).toBeInTheDocument();
    expect(
      mock.callsTo('GET /api/field-records').map((c) => c.url.searchParams.get('status')),
    ).toEqual(expect.arrayContaining(['draft', 'signed']));
    expect(document.title).toBe('Field work · Holdfast');
  });
});
