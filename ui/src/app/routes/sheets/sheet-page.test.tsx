import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import type { SheetDetail } from '@holdfast/shared';
import { createTestQueryClient, renderRoutes } from '../../../testing/render';
import { mockFetch } from '../../../testing/mock-fetch';
import { revisionSummary, testUsers } from '../../../testing/fixtures';
import { clientLoader, Component as SheetPage, readableRevisionId } from './sheet-page';

const person = { id: testUsers.engineer.id, displayName: 'Erin Vale', initials: 'EV' };
const draft = revisionSummary('A', 'draft');
const sheet: SheetDetail = {
  id: '00000000-0000-4000-8000-0000000000f1',
  documentNumber: 'HF-NRW-0003',
  title: 'Auxiliary hoist brake',
  sheetType: 'hoist-shoe-brake',
  site: { id: '00000000-0000-4000-8000-0000000000f2', code: 'NRW', name: 'Invented works' },
  machine: { id: '00000000-0000-4000-8000-0000000000f3', tag: 'LC-1', name: 'Ladle crane 1' },
  position: { id: '00000000-0000-4000-8000-0000000000f4', tag: 'AH-B1', description: 'Aux' },
  owner: person,
  latest: { id: draft.id, label: 'A', state: 'draft' },
  approved: null,
  updatedAt: '2026-12-01T08:00:00.000Z',
  criteriaSetId: 'crane-hoist',
  revisions: [draft],
};

describe('readableRevisionId', () => {
  it('opens engineers and checkers on the latest revision, draft or not', () => {
    expect(readableRevisionId(sheet, testUsers.engineer)).toBe(draft.id);
    expect(readableRevisionId(sheet, testUsers.checker)).toBe(draft.id);
  });

  it('gives fitters, viewers and admins nothing to fetch while the sheet has only a draft', () => {
    for (const user of [testUsers.technician, testUsers.viewer, testUsers.admin]) {
      expect(readableRevisionId(sheet, user)).toBeUndefined();
      expect(readableRevisionId(sheet, user, draft.id)).toBeUndefined();
    }
  });
});

describe('sheet page for a fitter', () => {
  it('asks the server for no draft it would refuse, and says plainly why none is shown', async () => {
    const mock = mockFetch({ [`GET /api/sheets/${sheet.id}`]: { body: sheet } });
    const queryClient = createTestQueryClient();
    renderRoutes(
      [{ path: '/sheets/:sheetId', loader: clientLoader(queryClient), Component: SheetPage }],
      { user: testUsers.technician, route: `/sheets/${sheet.id}`, queryClient },
    );
    expect(
      await screen.findByText(/Drafts are visible to engineers and checkers only/),
    ).toBeInTheDocument();
    expect(mock.calls.filter((c) => c.url.pathname.startsWith('/api/revisions'))).toEqual([]);
    expect(screen.queryByRole('button', { name: /Revisions/ })).toBeNull();
  });
});
