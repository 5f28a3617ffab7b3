import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import pg from 'pg';
import type { UserRow } from '@holdfast/db';
import { AppConfig } from '../config/app-config.js';

/** Safety net only: a missed notice could keep a row this long. Notices normally end it. */
const KEEP_MS = 30_000;
const RECONNECT_MS = 500;

/** Taken before a look-up; a row is kept only if nothing changed while it was read. */
export interface LookupTicket {
  readonly generation: number;
  readonly listening: boolean;
}

/**
 * The users rows the access check has read, kept in memory so a signed-in request needs no
 * look-up of its user. Safe only while this process hears every change: a trigger announces each
 * update of a users row on `holdfast_user_changed` when it commits (sign-out, password, role,
 * deactivation), and the entry is dropped. While the listening connection is down nothing is kept
 * and every request reads the database, so a sign-out on another process still ends the token.
 */
@Injectable()
export class SignedInUsers implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('SignedInUsers');
  private readonly rows = new Map<string, { row: UserRow; until: number }>();
  private generation = 0;
  private listening = false;
  private client: pg.Client | undefined;
  private retry: NodeJS.Timeout | undefined;
  private stopped = false;

  constructor(private readonly config: AppConfig) {}

  onModuleInit(): void {
    void this.listen();
  }

  async onModuleDestroy(): Promise<void> {
    this.stopped = true;
    clearTimeout(this.retry);
    this.rows.clear();
    await this.client?.end().catch(() => undefined);
  }

  ticket(): LookupTicket {
    return { generation: this.generation, listening: this.listening };
  }

  get(id: string): UserRow | undefined {
    const hit = this.rows.get(id);
    if (!hit || !this.listening) return undefined;
    if (hit.until < Date.now()) {
      this.rows.delete(id);
      return undefined;
    }
    return hit.row;
  }

  /** Keeps a row read after `ticket` was taken, unless a change or an outage came in between. */
  keep(row: UserRow, ticket: LookupTicket): void {
    if (!ticket.listening || !this.listening || ticket.generation !== this.generation) return;
    this.rows.set(row.id, { row, until: Date.now() + KEEP_MS });
  }

  /** This process changed the user: drop it at once, before the notice comes back. */
  forget(id: string): void {
    this.generation++;
    this.rows.delete(id);
  }

  /** Every row goes (the users table was emptied, or a test reset it with triggers off). */
  forgetAll(): void {
    this.generation++;
    this.rows.clear();
  }

  private async listen(): Promise<void> {
    const client = new pg.Client({
      connectionString: this.config.settings.DATABASE_URL,
      connectionTimeoutMillis: 5000,
    });
    this.client = client;
    client.on('error', () => this.lost(client));
    client.on('end', () => this.lost(client));
    client.on('notification', (n) => {
      if (n.payload === '*') this.forgetAll();
      else if (n.payload) this.forget(n.payload);
    });
    try {
      await client.connect();
      await client.query('listen holdfast_user_changed');
      if (this.client !== client) return;
      this.generation++;
      this.listening = true;
    } catch {
      this.lost(client);
    }
  }

  private lost(client: pg.Client): void {
    if (this.client !== client) return;
    this.client = undefined;
    if (this.listening) this.logger.warn('lost the user-change notices; reading users each time');
    this.listening = false;
    this.generation++;
    this.rows.clear();
    client.end().catch(() => undefined);
    if (this.stopped) return;
    clearTimeout(this.retry);
    this.retry = setTimeout(() => void this.listen(), RECONNECT_MS);
    this.retry.unref();
  }
}
