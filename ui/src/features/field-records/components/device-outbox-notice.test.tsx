import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { openDB } from 'idb';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import { noteServerAnswer, serverUnreachable } from '../../../lib/server-reach';
import { testUsers } from '../../../testing/fixtures';
import { mockFetch } from '../../../testing/mock-fetch';
import { renderWithProviders } from '../../../testing/render';
import { listOutbox, resetOutboxConnection, saveToOutbox } from '../offline/outbox-store';
import { DeviceOutboxNotice } from './device-outbox-notice';

const record = (id: string, findings: string): CreateFieldRecordInput => ({
  id,
  positionId: '2b1c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
  revisionId: '3c2d4e5f-6071-4b8c-9d0e-1f2a3b4c5d6e',
  kind: 'periodic-inspection',
  performedAt: '2026-12-01T09:30:00Z',
  meterHours: null,
  measurements: [],
  checks: [],
  findings,
});
const R1 = '0f5e2a1c-7d3b-4c8e-9a6f-1b2c3d4e5f60';
const R2 = '1a6f3b2d-8e4c-4d9f-8b7a-2c3d4e5f6071';
const technician = testUsers.technician;
const engineer = testUsers.engineer;

beforeEach(() => {
  globalThis.indexedDB = new IDBFactory();
  resetOutboxConnection();
  vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(true);
  noteServerAnswer(true);
});
afterEach(() => vi.restoreAllMocks());

describe('the device outbox as another user sees it', () => {
  it('names the other person and their count, and sends none of their records', async () => {
    await saveToOutbox(record(R1, 'by the technician'), technician);
    const mock = mockFetch({ 'POST /api/field-records': { status: 201 } });
    renderWithProviders(<DeviceOutboxNotice user={engineer} />, { user: engineer });
    const notice = await screen.findByTestId('others-outbox-notice');
    expect(notice).toHaveTextContent('Entries of another person are waiting on this device');
    expect(notice).toHaveTextContent(
      'Teo Marsh (TM): 1 field record, sent when Teo Marsh signs in on this device.',
    );
    expect(notice).toHaveTextContent('They are not sent under your name');
    await new Promise((r) => setTimeout(r, 50));
    expect(mock.callsTo('POST /api/field-records')).toHaveLength(0);
    expect((await listOutbox())[0]!.state).toBe('saved');
  });

  it('sends an unassigned record only after the user says it is theirs', async () => {
    const database = await openDB('holdfast-field-records', 1, {
      upgrade(d) {
        d.createObjectStore('outbox', { keyPath: 'id' }).createIndex('state', 'state');
      },
    });
    const payload = record(R2, 'kept by the old version');
    await database.put('outbox', {
      id: R2,
      payload,
      state: 'saved',
      savedAt: '2026-11-30T08:00:00Z',
      attempts: 0,
    });
    database.close();
    const mock = mockFetch({ 'POST /api/field-records': { status: 201, body: payload } });
    const { user } = renderWithProviders(<DeviceOutboxNotice user={engineer} />, {
      user: engineer,
    });
    const notice = await screen.findByTestId('unassigned-outbox-notice');
    expect(notice).toHaveTextContent('1 field record was saved here before Holdfast kept who');
    expect(notice).toHaveTextContent('kept by the old version');
    await new Promise((r) => setTimeout(r, 50));
    expect(mock.callsTo('POST /api/field-records')).toHaveLength(0);

    await user.click(
      screen.getByRole('button', { name: 'They are mine: send them as Erin Vale (EV)' }),
    );
    await waitFor(() => expect(mock.callsTo('POST /api/field-records')).toHaveLength(1));
    const [entry] = await listOutbox();
    expect(entry!.owner?.id).toBe(engineer.id);
  });

  it('sends their own waiting record when the server answers again, with no online event', async () => {
    await saveToOutbox(record(R1, 'kept while the server was away'), technician);
    let reachable = false;
    const mock = mockFetch({
      'POST /api/field-records': (req) => {
        if (!reachable) throw new TypeError('Failed to fetch');
        return { status: 201, body: req.body };
      },
    });
    renderWithProviders(<DeviceOutboxNotice user={technician} />, { user: technician });
    await waitFor(() => expect(mock.callsTo('POST /api/field-records')).toHaveLength(1));
    await waitFor(() => expect(serverUnreachable()).toBe(true));
    expect((await listOutbox())[0]!.state).not.toBe('sent');

    // Any other call answered (a list refreshed, say) tells the outbox the server is back.
    reachable = true;
    noteServerAnswer(true);
    await waitFor(() => expect(mock.callsTo('POST /api/field-records')).toHaveLength(2));
    expect(mock.callsTo('POST /api/field-records')[1]!.body).toMatchObject({ id: R1 });
  });
});
