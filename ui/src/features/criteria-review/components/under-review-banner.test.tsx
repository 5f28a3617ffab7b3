import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import type { CriteriaReview, RevisionCriteriaReview } from '@holdfast/shared';
import { jsonError, mockFetch, type MockRequest } from '../../../testing/mock-fetch';
import { renderWithProviders } from '../../../testing/render';
import { UnderReviewBanner } from './under-review-banner';

const REV = '11111111-1111-4111-8111-111111111111';
const flag: CriteriaReview = {
  id: '22222222-2222-4222-8222-222222222222',
  revisionId: REV,
  sheetId: '33333333-3333-4333-8333-333333333333',
  criteriaSetId: 'crane-hoist',
  criteriaSetName: 'Crane hoist holding brake',
  criteriaSetVersion: 2,
  failing: [{ id: 'pv', label: 'Lining p·v at set', value: 1.55e6, limit: 1e6, unit: 'Pa m/s' }],
  flaggedAt: '2026-12-01T08:00:00.000Z',
  clearedAt: null,
  clearedHow: null,
  clearedBy: null,
  disposition: null,
};

describe('UnderReviewBanner', () => {
  it('shows the open flag with its criteria version and failing checks', async () => {
    mockFetch({
      [`GET /api/revisions/${REV}/criteria-review`]: {
        body: { open: flag, cleared: [], canDispose: false } satisfies RevisionCriteriaReview,
      },
    });
    renderWithProviders(<UnderReviewBanner revisionId={REV} approved />);
    expect(
      await screen.findByText(
        'Under review since 2026-12-01: criteria Crane hoist holding brake v2',
      ),
    ).toBeInTheDocument();
    expect(screen.getByText(/Lining p·v at set/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Record why it stands' })).toBeNull();
  });

  it('lets a checker record why it stands, typed key by key, and shows the server’s field error', async () => {
    let state: RevisionCriteriaReview = { open: flag, cleared: [], canDispose: true };
    const mock = mockFetch({
      [`GET /api/revisions/${REV}/criteria-review`]: () => ({ body: state }),
      [`POST /api/revisions/${REV}/criteria-review/disposition`]: (req: MockRequest) => {
        const text = (req.body as { disposition: string }).disposition;
        if (text.length < 20)
          return jsonError(400, 'validation_failed', 'Some fields are not valid.', [
            { path: 'disposition', message: 'say more' },
          ]);
        state = {
          open: null,
          cleared: [
            {
              ...flag,
              clearedAt: '2026-12-02T08:00:00.000Z',
              clearedHow: 'disposition',
              clearedBy: {
                id: '44444444-4444-4444-8444-444444444444',
                displayName: 'Kim Lund',
                initials: 'KL',
              },
              disposition: text,
            },
          ],
          canDispose: false,
        };
        return { body: state };
      },
    });
    const { user } = renderWithProviders(<UnderReviewBanner revisionId={REV} approved />);
    await user.click(await screen.findByRole('button', { name: 'Record why it stands' }));
    const box = await screen.findByRole('textbox', { name: /Stands because/ });
    await user.type(box, 'Too short');
    await user.click(screen.getByRole('button', { name: 'Record disposition' }));
    expect(await screen.findByText('say more')).toBeInTheDocument();
    await user.clear(box);
    await user.type(box, 'Lining maker confirms 1.6 MPa·m/s for this duty.');
    await user.click(screen.getByRole('button', { name: 'Record disposition' }));
    const stands = await screen.findByText(
      'Lining maker confirms 1.6 MPa·m/s for this duty.',
      { selector: '[data-review-disposition] p' },
      { timeout: 5000 },
    );
    expect(stands).toBeInTheDocument();
    expect(screen.queryByText(/Under review since/)).toBeNull();
    expect(mock.callsTo(`POST /api/revisions/${REV}/criteria-review/disposition`)).toHaveLength(2);
  });

  it('asks nothing for a revision that is not approved', () => {
    const mock = mockFetch({});
    renderWithProviders(<UnderReviewBanner revisionId={REV} approved={false} />);
    expect(mock.calls).toHaveLength(0);
  });
});
