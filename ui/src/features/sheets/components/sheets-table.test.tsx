import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import type { SheetSummary } from '@holdfast/shared';
import { renderWithProviders } from '../../../testing/render';
import { SheetsTable } from './sheets-table';

const sheet: SheetSummary = {
  id: '1f2e3d4c-5b6a-4978-8a9b-0c1d2e3f4a5b',
  documentNumber: 'HF-NRW-0001',
  title: 'Ladle crane main hoist brake',
  sheetType: 'hoist-shoe-brake',
  site: { id: '2a3b4c5d-6e7f-4a8b-9c0d-1e2f3a4b5c6d', code: 'NRW', name: 'Invented works' },
  machine: { id: '3b4c5d6e-7f8a-4b9c-8d1e-2f3a4b5c6d7e', tag: 'LC-1', name: 'Ladle crane 1' },
  position: { id: '4c5d6e7f-8a9b-4c0d-9e2f-3a4b5c6d7e8f', tag: 'MH-B1', description: 'Hoist' },
  owner: {
    id: '5d6e7f8a-9b0c-4d1e-8f3a-4b5c6d7e8f9a',
    displayName: 'Test Engineer',
    initials: 'TE',
  },
  latest: { id: '6e7f8a9b-0c1d-4e2f-9a4b-5c6d7e8f9a0b', label: 'C', state: 'approved' },
  approved: {
    id: '6e7f8a9b-0c1d-4e2f-9a4b-5c6d7e8f9a0b',
    label: 'C',
    approvedAt: '2026-12-04T10:00:00.000Z',
  },
  updatedAt: '2026-12-04T10:00:00.000Z',
};

describe('sheets table', () => {
  it('keeps position codes and the revision in force on one line each', () => {
    renderWithProviders(
      <SheetsTable items={[sheet]} sort="documentNumber" order="asc" onSort={() => {}} />,
    );
    expect(screen.getByText('NRW · LC-1').closest('td')).toHaveStyle({ whiteSpace: 'nowrap' });
    expect(screen.getByText('Rev. C').closest('td')).toHaveStyle({ whiteSpace: 'nowrap' });
  });
});
