import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import type { Revision } from '@holdfast/shared';
import { testUsers } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { CheckActions } from './check-actions';

/** The parts of a revision CheckActions reads. */
const revision = (canCheck: boolean) =>
  ({
    id: '3c4d5e6f-7081-4293-a4b5-c6d7e8f90a1b',
    label: 'B',
    state: 'in_check',
    rowVersion: 2,
    justification: null,
    author: { id: 'a1b2c3d4-e5f6-4789-8abc-def012345678', displayName: 'Ada Demo', initials: 'AD' },
    canCheck,
  }) as unknown as Revision;

describe('check actions', () => {
  it('offers a checker who may check Return and Approve', () => {
    renderWithProviders(<CheckActions revision={revision(true)} openComments={0} />, {
      user: testUsers.checker,
    });
    expect(screen.getByRole('button', { name: 'Approve' })).toBeInTheDocument();
    expect(screen.queryByTestId('no-check-reason')).toBeNull();
  });

  it('tells a checker who wrote or submitted the revision why Approve is not there', () => {
    renderWithProviders(<CheckActions revision={revision(false)} openComments={0} />, {
      user: testUsers.checker,
    });
    expect(screen.queryByRole('button', { name: 'Approve' })).toBeNull();
    expect(screen.getByTestId('no-check-reason')).toHaveTextContent(
      'another checker approves or returns it',
    );
  });

  it('says nothing to an engineer, who never checks', () => {
    renderWithProviders(<CheckActions revision={revision(false)} openComments={0} />, {
      user: testUsers.engineer,
    });
    expect(screen.queryByTestId('no-check-reason')).toBeNull();
  });
});
