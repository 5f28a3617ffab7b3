import { describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import type { CheckResult } from '@holdfast/calc';
import { ApiRequestError } from '../../../lib/api-error';
import { renderWithProviders } from '../../../testing/render';
import { ApproveDialog } from './approve-dialog';
import { ReturnDialog } from './return-dialog';
import { SubmitDialog } from './submit-dialog';

const failing: CheckResult = {
  id: 'torque',
  section: 'brake',
  label: 'Brake torque at worn lining',
  value: 1,
  limit: 2,
  unit: 'N m',
  dimension: 'torque',
  kind: 'min',
  utilisation: 2,
  pass: false,
  source: 'test',
  message: '',
};

describe('ReturnDialog', () => {
  it('will not return without saying what must change, then sends the comment', async () => {
    const onReturn = vi.fn().mockResolvedValue(undefined);
    const onClose = vi.fn();
    const { user } = renderWithProviders(
      <ReturnDialog opened onClose={onClose} authorName="Erin Vale" onReturn={onReturn} />,
    );
    const box = await screen.findByRole('textbox', { name: /What must change/ });
    await waitFor(() => expect(box).toHaveFocus());
    await user.click(screen.getByRole('button', { name: 'Return' }));
    expect(screen.getByText('Say what must change.')).toBeInTheDocument();
    expect(onReturn).not.toHaveBeenCalled();
    await user.type(box, 'Spring force too low at worn lining');
    await user.click(screen.getByRole('button', { name: 'Return' }));
    expect(onReturn).toHaveBeenCalledWith('Spring force too low at worn lining');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
  });
});

describe('SubmitDialog', () => {
  it('requires a justification when checks fail and lists them', async () => {
    const onSubmit = vi.fn().mockResolvedValue(undefined);
    const { user } = renderWithProviders(
      <SubmitDialog
        opened
        onClose={() => undefined}
        failingChecks={[failing]}
        onSubmit={onSubmit}
      />,
    );
    expect(await screen.findByText('Brake torque at worn lining')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Send for check' }));
    expect(screen.getByText('Give a reason: checks fail.')).toBeInTheDocument();
    expect(onSubmit).not.toHaveBeenCalled();
    await user.type(
      screen.getByRole('textbox', { name: /Why this should go to check anyway/ }),
      'Re-adjusted before wear limit',
    );
    await user.click(screen.getByRole('button', { name: 'Send for check' }));
    expect(onSubmit).toHaveBeenCalledWith('Re-adjusted before wear limit');
  });

  it('sends without a note when every check passes', async () => {
    const onSubmit = vi.fn().mockResolvedValue(undefined);
    const { user } = renderWithProviders(
      <SubmitDialog opened onClose={() => undefined} failingChecks={[]} onSubmit={onSubmit} />,
    );
    await user.click(await screen.findByRole('button', { name: 'Send for check' }));
    expect(onSubmit).toHaveBeenCalledWith(undefined);
  });

  it('shows the server’s field error under the box and stays open', async () => {
    const error = new ApiRequestError(400, 'validation_failed', 'Invalid', [
      { path: 'justification', message: 'required when checks fail' },
    ]);
    const onClose = vi.fn();
    const { user } = renderWithProviders(
      <SubmitDialog
        opened
        onClose={onClose}
        failingChecks={[]}
        onSubmit={() => Promise.reject(error)}
      />,
    );
    await user.click(await screen.findByRole('button', { name: 'Send for check' }));
    expect(await screen.findByText('required when checks fail')).toBeInTheDocument();
    expect(onClose).not.toHaveBeenCalled();
  });
});

describe('ApproveDialog', () => {
  it('with comments open, asks why before approving and passes the note on', async () => {
    const onApprove = vi.fn().mockResolvedValue(undefined);
    const { user } = renderWithProviders(
      <ApproveDialog
        opened
        onClose={() => undefined}
        revisionLabel="B"
        openComments={2}
        onApprove={onApprove}
      />,
    );
    expect(
      await screen.findByText(
        /^2 comments are still open, and stay open on the approved revision for good/,
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('dialog', { name: 'Approve revision B' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Approve' }));
    expect(
      await screen.findByText(
        '2 comments are still open: resolve them first, or say here why you approve.',
      ),
    ).toBeInTheDocument();
    expect(onApprove).not.toHaveBeenCalled();
    await user.type(
      screen.getByRole('textbox', { name: /Approval note \(required while comments are open\)/ }),
      'Both answered in the replies; nothing left to change.',
    );
    await user.click(screen.getByRole('button', { name: 'Approve' }));
    expect(onApprove).toHaveBeenCalledWith('Both answered in the replies; nothing left to change.');
  });

  it('with checks failing, names them and asks why before approving', async () => {
    const onApprove = vi.fn().mockResolvedValue(undefined);
    const { user } = renderWithProviders(
      <ApproveDialog
        opened
        onClose={() => undefined}
        revisionLabel="D"
        openComments={0}
        failingChecks={[
          'Stopping distance at the load ≤ allowed',
          'p·v when the brake sets ≤ limit',
        ]}
        onApprove={onApprove}
      />,
    );
    const list = await screen.findByTestId('approve-failing-checks');
    expect(list).toHaveTextContent('2 checks fail, and are signed failing:');
    expect(list).toHaveTextContent('Stopping distance at the load ≤ allowed');
    await user.click(screen.getByRole('button', { name: 'Approve' }));
    expect(await screen.findByText('2 checks fail: say here why you approve.')).toBeInTheDocument();
    expect(onApprove).not.toHaveBeenCalled();
    await user.type(
      screen.getByRole('textbox', { name: /Approval note \(required: why it is approved/ }),
      'Temporary duty; the maker confirms the margin in writing.',
    );
    await user.click(screen.getByRole('button', { name: 'Approve' }));
    expect(onApprove).toHaveBeenCalledWith(
      'Temporary duty; the maker confirms the margin in writing.',
    );
  });

  it('with no comment open, the note is optional', async () => {
    const onApprove = vi.fn().mockResolvedValue(undefined);
    const { user } = renderWithProviders(
      <ApproveDialog
        opened
        onClose={() => undefined}
        revisionLabel="C"
        openComments={0}
        onApprove={onApprove}
      />,
    );
    await user.click(await screen.findByRole('button', { name: 'Approve' }));
    expect(onApprove).toHaveBeenCalledWith(undefined);
  });

  it('shows a refusal plainly', async () => {
    const error = new ApiRequestError(403, 'forbidden', 'You cannot approve your own revision.');
    const { user } = renderWithProviders(
      <ApproveDialog
        opened
        onClose={() => undefined}
        revisionLabel="A"
        openComments={0}
        onApprove={() => Promise.reject(error)}
      />,
    );
    await user.click(await screen.findByRole('button', { name: 'Approve' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'You cannot approve your own revision.',
    );
  });
});
