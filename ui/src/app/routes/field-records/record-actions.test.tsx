import { act, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { useSignFieldRecord } from '../../../features/field-records/api/sign-field-record';
import type { OutboxEntry } from '../../../features/field-records/offline/outbox-store';
import { useOnline } from '../../../features/field-records/offline/use-online';
import { noteServerAnswer } from '../../../lib/server-reach';
import { testUsers } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { RecordActions } from './record-actions';

const entry = (state: OutboxEntry['state'], message?: string): OutboxEntry => ({
  id: '0f5e2a1c-7d3b-4c8e-9a6f-1b2c3d4e5f60',
  owner: testUsers.technician,
  payload: {
    id: '0f5e2a1c-7d3b-4c8e-9a6f-1b2c3d4e5f60',
    positionId: '2b1c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
    revisionId: '3c2d4e5f-6071-4b8c-9d0e-1f2a3b4c5d6e',
    kind: 'periodic-inspection',
    performedAt: '2026-12-01T09:30:00Z',
    meterHours: null,
    measurements: [],
    checks: [],
    findings: '',
  },
  state,
  savedAt: '2026-12-01T09:31:00Z',
  attempts: 1,
  message,
});

/** The record form's status line and buttons, fed the same `online` the form reads. */
function Actions({
  item,
  changes,
}: {
  item: OutboxEntry;
  changes?: Parameters<typeof RecordActions>[0]['changes'];
}) {
  const online = useOnline();
  const sign = useSignFieldRecord();
  return (
    <RecordActions
      entry={item}
      online={online}
      sign={sign}
      onSave={() => {}}
      onStartAnother={() => {}}
      changes={changes}
    />
  );
}

const NO_CONNECTION = 'No connection: it is sent when the connection returns.';

beforeEach(() => {
  // The device's link is up throughout: only the server's silence says there is no connection.
  vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(true);
  noteServerAnswer(true);
});
afterEach(() => {
  noteServerAnswer(true);
  vi.restoreAllMocks();
});

describe('the record form while the server does not answer (link up)', () => {
  it('says a saved record waits for the connection, and drops that once the server answers', () => {
    renderWithProviders(<Actions item={entry('saved', 'Failed to fetch')} />, {
      user: testUsers.technician,
    });
    expect(screen.queryByText(NO_CONNECTION)).toBeNull();
    expect(screen.getByText('Last try: Failed to fetch')).toBeInTheDocument();

    act(() => noteServerAnswer(false));
    expect(screen.getByText(NO_CONNECTION)).toBeInTheDocument();
    expect(screen.queryByText(/^Last try:/)).toBeNull();

    act(() => noteServerAnswer(true));
    expect(screen.queryByText(NO_CONNECTION)).toBeNull();
  });

  it('keeps "Sign the record" disabled until the server answers again', () => {
    renderWithProviders(<Actions item={entry('sent')} />, { user: testUsers.technician });
    const signButton = () => screen.getByRole('button', { name: 'Sign the record' });
    expect(signButton()).toBeEnabled();

    act(() => noteServerAnswer(false));
    expect(signButton()).toBeDisabled();

    act(() => noteServerAnswer(true));
    expect(signButton()).toBeEnabled();
  });
});

describe('the record form changed after the server has the record', () => {
  it('offers Save changes and keeps Sign disabled until they are saved', () => {
    const onSave = vi.fn();
    const changes = { pending: true, saving: false, error: null, onSave };
    const view = renderWithProviders(<Actions item={entry('sent')} changes={changes} />, {
      user: testUsers.technician,
    });
    expect(screen.getByRole('button', { name: 'Sign the record' })).toBeDisabled();
    expect(screen.getByTestId('unsaved-changes')).toHaveTextContent(
      /save the changes before signing/,
    );
    act(() => screen.getByRole('button', { name: 'Save changes' }).click());
    expect(onSave).toHaveBeenCalledTimes(1);

    view.unmount();
    renderWithProviders(<Actions item={entry('sent')} changes={{ ...changes, pending: false }} />, {
      user: testUsers.technician,
    });
    expect(screen.queryByRole('button', { name: 'Save changes' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Sign the record' })).toBeEnabled();
  });

  it('says to connect when the changes cannot be saved now', () => {
    const changes = { pending: true, saving: false, error: null, onSave: () => {} };
    renderWithProviders(<Actions item={entry('sent')} changes={changes} />, {
      user: testUsers.technician,
    });
    act(() => noteServerAnswer(false));
    expect(screen.getByRole('button', { name: 'Save changes' })).toBeDisabled();
    expect(screen.getByTestId('unsaved-changes')).toHaveTextContent(/connect to save the changes/);
  });
});
