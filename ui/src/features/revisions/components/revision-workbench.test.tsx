import { describe, expect, it } from 'vitest';
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { renderWithProviders } from '../../../testing/render';
import { jsonError, mockFetch } from '../../../testing/mock-fetch';
import { testUsers } from '../../../testing/fixtures';
import {
  fixtureCriteria,
  leverBrakeFixture,
} from '../../../components/calc/testing/lever-brake-fixture';
import { makeRevision } from '../testing-revision';
import { RevisionWorkbench } from './revision-workbench';

const PUT = 'PUT /api/revisions/11111111-1111-4111-8111-111111111111';

function renderBench(revision = makeRevision()) {
  return renderWithProviders(
    <RevisionWorkbench
      revision={revision}
      sheetType={leverBrakeFixture}
      criteria={fixtureCriteria}
    />,
    { user: testUsers.engineer },
  );
}

function torqueCheck() {
  return screen.getByRole('listitem', { name: /Brake torque against required/ });
}

describe('RevisionWorkbench', () => {
  it('recalculates live: raising the spring force turns a failed check into a pass', async () => {
    mockFetch({
      [PUT]: (req) => ({ body: { ...makeRevision(), ...(req.body as object), rowVersion: 4 } }),
    });
    renderBench();
    // 2 · 0.4 · 2000 N · 2 · 0.2 m = 640 N·m against 1000 N·m × 1.5 → fail.
    expect(torqueCheck()).toHaveAccessibleName(/fail/);
    expect(torqueCheck()).toHaveTextContent('640.0 N·m');
    const force = screen.getByRole('textbox', { name: /Spring force/ });
    fireEvent.change(force, { target: { value: '5000' } });
    // 1600 N·m ≥ 1500 N·m → pass, without waiting for any save.
    expect(torqueCheck()).toHaveAccessibleName(/pass/);
    expect(torqueCheck()).toHaveTextContent('1600 N·m');
    expect(within(torqueCheck()).getByText('Pass')).toBeInTheDocument();
    const time = screen.getByTestId('recalc-time').textContent!;
    expect(Number.parseFloat(time)).toBeLessThan(16);
  });

  it('puts a calc field error on its field and keeps the last results dimmed', () => {
    mockFetch({});
    renderBench();
    fireEvent.change(screen.getByRole('textbox', { name: /Spring force/ }), {
      target: { value: '12 parsecs' },
    });
    expect(screen.getByText(/“parsecs” is not a unit for this field/)).toBeInTheDocument();
    expect(screen.getByText('Some inputs need attention')).toBeInTheDocument();
    expect(screen.getByText(/from the last valid inputs/)).toBeInTheDocument();
    // The count says whose it is: not "n of n checks pass" beside an input that is not valid.
    expect(screen.getByTestId('check-count')).toHaveTextContent(
      /^with the last valid inputs \d+ of \d+ checks passed/,
    );
    expect(torqueCheck()).toHaveTextContent('640.0 N·m');
  });

  it('autosaves after a pause with the row version it was based on', async () => {
    const api = mockFetch({
      [PUT]: (req) => ({ body: { ...makeRevision(), ...(req.body as object), rowVersion: 4 } }),
    });
    renderBench();
    fireEvent.change(screen.getByRole('textbox', { name: /Spring force/ }), {
      target: { value: '2600' },
    });
    expect(screen.getByText('Unsaved changes')).toBeInTheDocument();
    await waitFor(() => expect(api.callsTo(PUT)).toHaveLength(1), { timeout: 3000 });
    const body = api.callsTo(PUT)[0]!.body as {
      rowVersion: number;
      inputs: Record<string, unknown>;
    };
    expect(body.rowVersion).toBe(3);
    expect(body.inputs.springForce).toEqual({ value: 2600, unit: 'N' });
    await screen.findByText(/All changes saved/);
  });

  it('shows the conflict dialog on 409 and can keep my inputs as a new save', async () => {
    let puts = 0;
    const api = mockFetch({
      [PUT]: (req) => {
        puts += 1;
        if (puts === 1)
          return {
            status: 409,
            body: {
              error: { code: 'conflict', message: 'changed', details: { currentRowVersion: 7 } },
            },
          };
        return { body: { ...makeRevision(), ...(req.body as object), rowVersion: 8 } };
      },
      'GET /api/revisions/11111111-1111-4111-8111-111111111111': {
        body: makeRevision({ rowVersion: 7 }),
      },
    });
    const { user } = renderBench();
    fireEvent.change(screen.getByRole('textbox', { name: /Spring force/ }), {
      target: { value: '2700' },
    });
    const dialog = await screen.findByRole(
      'dialog',
      { name: 'This draft was changed elsewhere' },
      { timeout: 3000 },
    );
    await user.click(within(dialog).getByRole('button', { name: 'Keep mine' }));
    await waitFor(() => expect(api.callsTo(PUT)).toHaveLength(2));
    const second = api.callsTo(PUT)[1]!.body as {
      rowVersion: number;
      inputs: Record<string, unknown>;
    };
    expect(second.rowVersion).toBe(7);
    expect(second.inputs.springForce).toEqual({ value: 2700, unit: 'N' });
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
  });

  it('puts the server’s 400 field errors on the fields', async () => {
    mockFetch({
      [PUT]: jsonError(400, 'validation_failed', 'Invalid', [
        { path: 'inputs.leverRatio', message: 'too large for this brake' },
      ]),
    });
    renderBench();
    fireEvent.change(screen.getByRole('textbox', { name: /Lever ratio/ }), {
      target: { value: '3' },
    });
    expect(
      await screen.findByText('too large for this brake', {}, { timeout: 3000 }),
    ).toBeInTheDocument();
  });

  it('renders a frozen revision read-only from its stored evaluation', () => {
    mockFetch({});
    const stored = leverBrakeFixture.evaluate(makeRevision().inputs, fixtureCriteria);
    renderBench(
      makeRevision({
        state: 'approved',
        canEdit: false,
        canSubmit: false,
        evaluation: stored,
        coreVersion: '1.0.0',
      }),
    );
    expect(screen.getByText(/approved and can never change/)).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: /Spring force/ })).toHaveAttribute('readonly');
    expect(screen.getByText(/Stored at submission/)).toBeInTheDocument();
    expect(screen.queryByTestId('recalc-time')).not.toBeInTheDocument();
  });

  it('says a draft read by someone who cannot edit it shows what was stored at the last save', () => {
    mockFetch({});
    const stored = leverBrakeFixture.evaluate(makeRevision().inputs, fixtureCriteria);
    renderBench(
      makeRevision({
        state: 'draft',
        canEdit: false,
        canSubmit: false,
        submittedAt: null,
        evaluation: stored,
        coreVersion: '1.0.0',
      }),
    );
    expect(screen.getByText(/Stored at the last save \(1\.0\.0\)/)).toBeInTheDocument();
    expect(screen.queryByText(/Stored at submission/)).not.toBeInTheDocument();
  });

  it('switching to US customary converts the inputs and the results', async () => {
    mockFetch({
      [PUT]: (req) => ({ body: { ...makeRevision(), ...(req.body as object), rowVersion: 4 } }),
    });
    const { user } = renderBench();
    await user.click(screen.getByRole('radio', { name: 'US customary' }));
    expect(screen.getByRole('combobox', { name: 'Spring force unit' })).toHaveValue('lbf');
    const force = Number(
      (screen.getByRole('textbox', { name: /Spring force/ }) as HTMLInputElement).value,
    );
    expect(Math.abs(force - 449.618)).toBeLessThan(0.01);
    expect(torqueCheck()).toHaveTextContent('lbf·ft');
    await act(async () => undefined);
  });
});
