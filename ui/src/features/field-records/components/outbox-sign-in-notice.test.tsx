import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, screen } from '@testing-library/react';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import { Component as SignInPage } from '../../../app/routes/auth/sign-in';
import { makeSession, testUsers } from '../../../testing/fixtures';
import { refreshSession } from '../../../lib/api-client';
import { noteServerAnswer, SERVER_RETRY_MS } from '../../../lib/server-reach';
import { mockFetch } from '../../../testing/mock-fetch';
import { renderRoutes } from '../../../testing/render';
import { resetOutboxConnection, saveToOutbox } from '../offline/outbox-store';

const record: CreateFieldRecordInput = {
  id: '0f5e2a1c-7d3b-4c8e-9a6f-1b2c3d4e5f60',
  positionId: '2b1c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
  revisionId: '3c2d4e5f-6071-4b8c-9d0e-1f2a3b4c5d6e',
  kind: 'periodic-inspection',
  performedAt: '2026-12-01T09:30:00Z',
  meterHours: null,
  measurements: [],
  checks: [],
  findings: 'Checked offline',
};
const owner = testUsers.technician;
const formPath = `/field-records/new/${record.revisionId}`;

function setOnline(online: boolean) {
  vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(online);
}

function renderSignIn() {
  return renderRoutes(
    [
      { path: '/sign-in', Component: SignInPage },
      { path: '/field-records/new/:revisionId', element: <h1>Record form</h1> },
    ],
    { route: `/sign-in?next=${encodeURIComponent(formPath)}` },
  );
}

beforeEach(() => {
  globalThis.indexedDB = new IDBFactory();
  resetOutboxConnection();
  noteServerAnswer(true);
});
afterEach(() => {
  vi.useRealTimers();
  vi.restoreAllMocks();
});

describe('sign-in page after a reload without a connection', () => {
  it('says plainly that saved work waits on the device, and signs back in when online', async () => {
    await saveToOutbox(record, owner, new Date(), [
      {
        id: 'p1',
        name: 'shoe-a.jpg',
        type: 'image/jpeg',
        size: 3,
        bytes: new ArrayBuffer(3),
        state: 'waiting',
      },
    ]);
    setOnline(false);
    const mock = mockFetch({
      'POST /api/auth/refresh': { body: makeSession(testUsers.technician) },
    });
    renderSignIn();
    const notice = await screen.findByTestId('offline-notice');
    expect(notice).toHaveTextContent('No connection');
    expect(notice).toHaveTextContent('cannot open the record form until it returns');
    expect(
      await screen.findByText(
        /Nothing saved is lost: 1 field record and 1 photo saved on this device wait here and are sent once the connection is back and the person who saved them is signed in\./,
      ),
    ).toBeInTheDocument();
    expect(mock.callsTo('POST /api/auth/refresh')).toHaveLength(0);

    setOnline(true);
    await act(async () => {
      window.dispatchEvent(new Event('online'));
    });
    // The session cookie is tried at once and the fitter is back on the record form.
    expect(await screen.findByRole('heading', { name: 'Record form' })).toBeInTheDocument();
    expect(mock.callsTo('POST /api/auth/refresh')).toHaveLength(1);
  });

  it('counts an unanswered server as no connection although the browser says online, and asks it again', async () => {
    await saveToOutbox(record, owner);
    setOnline(true);
    let reachable = false;
    const mock = mockFetch({
      'POST /api/auth/refresh': () => {
        if (!reachable) throw new TypeError('Failed to fetch');
        return { body: makeSession(testUsers.technician) };
      },
    });
    // As on a reload: the app tried the session cookie first and got no answer.
    expect(await refreshSession()).toBe(false);
    vi.useFakeTimers({ shouldAdvanceTime: true });
    renderSignIn();
    const notice = await screen.findByTestId('offline-notice');
    expect(notice).toHaveTextContent('cannot open the record form until it returns');

    // Still out of reach at the next try: the notice stays.
    await act(() => vi.advanceTimersByTimeAsync(SERVER_RETRY_MS));
    expect(mock.callsTo('POST /api/auth/refresh')).toHaveLength(2);
    expect(screen.getByTestId('offline-notice')).toBeInTheDocument();

    // The server answers again, with no 'online' event from the browser: back on the form.
    reachable = true;
    await act(() => vi.advanceTimersByTimeAsync(SERVER_RETRY_MS));
    expect(await screen.findByRole('heading', { name: 'Record form' })).toBeInTheDocument();
    expect(mock.callsTo('POST /api/auth/refresh')).toHaveLength(3);
  });

  it('online, tells the user that records kept on the device go once they sign in', async () => {
    await saveToOutbox(record, owner);
    setOnline(true);
    renderSignIn();
    expect(await screen.findByTestId('outbox-notice')).toHaveTextContent(
      `1 field record saved on this device by Teo Marsh (TM) is waiting to be sent: it goes once Teo Marsh signs in.`,
    );
    expect(screen.queryByTestId('offline-notice')).toBeNull();
  });

  it('says nothing online when the device holds nothing', async () => {
    setOnline(true);
    renderSignIn();
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    await act(() => new Promise((r) => setTimeout(r, 50)));
    expect(screen.queryByTestId('outbox-notice')).toBeNull();
    expect(screen.queryByTestId('offline-notice')).toBeNull();
  });
});
