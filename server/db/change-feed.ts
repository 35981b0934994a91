import { LRUCache } from 'lru-cache';
import { Client } from 'pg';
import type { CHANGE_CHANNELS } from '../../migrations/1764637200000-change-notify';
import { SERVER_APPLICATION_NAME } from './data-source';

export type ChangeChannel = keyof typeof CHANGE_CHANNELS;

/**
 * A backstop, not the mechanism: nothing is kept longer than this even if every notice were lost without
 * the connection showing it (the heartbeat below catches a dead connection within HEARTBEAT_MS + 3 s).
 */
const KEEP_AT_MOST_MS = 5 * 60_000;
const HEARTBEAT_MS = 5000;

export interface KeepOptions<V> {
  maxSize: number;
  sizeOf: (value: V) => number;
  ttlMs?: number;
}

/** Values read from the database, kept until a change to their tables is announced. */
export class Kept<V extends object> {
  private generation = 0;
  private readonly values: LRUCache<string, V>;

  constructor(
    private readonly feed: ChangeFeed,
    options: KeepOptions<V>,
  ) {
    this.values = new LRUCache<string, V>({ maxSize: options.maxSize, sizeCalculation: (v) => Math.max(1, options.sizeOf(v)), ttl: options.ttlMs ?? KEEP_AT_MOST_MS });
  }

  /** Drops every kept value. */
  invalidate(): void {
    this.generation++;
    this.values.clear();
  }

  /** Taken before reading the database; null while nothing can be kept (the feed is not listening). */
  ticket(): number | null {
    return this.feed.isListening ? this.generation : null;
  }

  get(key: string): V | undefined {
    return this.feed.isListening ? this.values.get(key) : undefined;
  }

  /** Keeps a value read after `ticket` was taken, unless a change was announced since. Returns whether it was kept. */
  set(key: string, ticket: number | null, value: V): boolean {
    if (ticket === null || ticket !== this.generation || !this.feed.isListening) return false;
    this.values.set(key, value);
    return true;
  }

  /** A kept value, or one read now (and kept if nothing changed meanwhile). */
  async through(key: string, read: () => Promise<V>): Promise<V> {
    const kept = this.get(key);
    if (kept !== undefined) return kept;
    const ticket = this.ticket();
    const value = await read();
    this.set(key, ticket, value);
    return value;
  }
}

/**
 * One LISTEN connection per server process for the channels the change triggers notify (migration
 * 1764637200000), delivered at commit. A notice drops what is kept from that channel's tables. While the
 * connection is down nothing is kept or served from memory, since notices would be missed; when it is back,
 * everything starts empty. A value is kept only if no notice arrived while it was being read (the ticket),
 * so a value read before a change is never kept after that change's notice.
 */
export class ChangeFeed {
  private client: Client | null = null;
  private listening = false;
  private stopped = false;
  private retry: NodeJS.Timeout | null = null;
  private heartbeat: NodeJS.Timeout | null = null;
  private readonly kept = new Map<ChangeChannel, Array<Kept<object>>>();

  constructor(
    private readonly databaseUrl: string,
    private readonly reconnectMs = 1000,
  ) {}

  /** A store of values from one channel's tables, bounded by the total of `sizeOf`. */
  keep<V extends object>(channel: ChangeChannel, options: KeepOptions<V>): Kept<V> {
    const store = new Kept<V>(this, options);
    this.kept.set(channel, [...(this.kept.get(channel) ?? []), store as unknown as Kept<object>]);
    return store;
  }

  get isListening(): boolean {
    return this.listening;
  }

  /** Connects; resolves once listening, or after the first failure (it then retries in the background). */
  async start(): Promise<void> {
    this.stopped = false;
    await this.connect();
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.retry) clearTimeout(this.retry);
    this.retry = null;
    this.down();
    const client = this.client;
    this.client = null;
    if (client) await client.end().catch(() => undefined);
  }

  /** Drops everything kept, from every channel: this process has just committed a change. */
  invalidateAll(): void {
    for (const stores of this.kept.values()) for (const s of stores) s.invalidate();
  }

  private down(): void {
    this.listening = false;
    if (this.heartbeat) clearInterval(this.heartbeat);
    this.heartbeat = null;
    this.invalidateAll();
  }

  private async connect(): Promise<void> {
    if (this.stopped) return;
    const client = new Client({
      connectionString: this.databaseUrl,
      application_name: SERVER_APPLICATION_NAME,
      connectionTimeoutMillis: 3000,
      keepAlive: true,
      keepAliveInitialDelayMillis: 10_000,
      query_timeout: 3000,
    });
    client.on('notification', (msg) => {
      for (const s of this.kept.get(msg.channel as ChangeChannel) ?? []) s.invalidate();
    });
    const lost = () => {
      if (this.client !== client) return;
      this.client = null;
      this.down();
      this.schedule();
    };
    client.on('error', lost);
    client.on('end', lost);
    this.client = client;
    try {
      await client.connect();
      for (const channel of this.kept.keys()) await client.query(`LISTEN ${channel}`);
      if (this.client !== client) return;
      // Changes committed before LISTEN took effect were never announced here: start empty.
      this.invalidateAll();
      this.listening = true;
      // A connection dropped without a word (a firewall, a fail-over) would otherwise go unnoticed for
      // hours while notices are lost: a query that does not answer within 3 s ends it.
      this.heartbeat = setInterval(() => {
        client.query('SELECT 1').catch(() => {
          lost();
          void client.end().catch(() => undefined);
        });
      }, HEARTBEAT_MS);
      this.heartbeat.unref();
    } catch {
      lost();
      await client.end().catch(() => undefined);
    }
  }

  private schedule(): void {
    if (this.stopped || this.retry) return;
    this.retry = setTimeout(() => {
      this.retry = null;
      void this.connect();
    }, this.reconnectMs);
    this.retry.unref();
  }
}
