import { AsyncLocalStorage } from "node:async_hooks";
import { E_TIMEOUT, Mutex, withTimeout, type MutexInterface } from "async-mutex";
import type { Sequelize, Transaction } from "sequelize";

/**
 * Raised when a write waited longer than the limit for this process's turn at the database, or
 * SQLite still reported the file busy (another process held the lock) after its busy timeout.
 * The error handler answers it with 503 and Retry-After: the request is fine, the moment is not.
 */
export class DatabaseBusyError extends Error {
  override name = "DatabaseBusyError";
}

/** Statements that take SQLite's write lock when run outside a transaction. */
const WRITE_STATEMENT = /^\s*(insert|update|delete|replace|create|drop|alter|vacuum|reindex|analyze)\b/i;
const WRITE_QUERY_TYPES = new Set(["INSERT", "UPDATE", "BULKUPDATE", "BULKDELETE", "DELETE", "UPSERT"]);

interface TurnHeld {
  held: boolean;
}

/**
 * Lets one write transaction (or one stand-alone write statement) of this process at the
 * database at a time; reads stay concurrent under WAL.
 *
 * WHY: node-sqlite3 runs each statement on libuv's 4-thread pool and Sequelize opens a
 * connection per transaction. Transactions that wait out SQLite's busy timeout each sit on a
 * pool thread, so with four of them waiting the one that holds the lock can no longer run its
 * next statement: a burst of saves then stalled and failed with SQLITE_BUSY. Waiting in a
 * JavaScript queue instead costs no thread.
 *
 * Inside a transaction callback (tracked with AsyncLocalStorage) statements pass straight
 * through, so code that holds the turn never waits for itself.
 */
export function serializeWrites(sequelize: Sequelize, options: { waitLimitMs: number }): void {
  const turn: MutexInterface = withTimeout(new Mutex(), options.waitLimitMs, new DatabaseBusyError("timeout"));
  const inside = new AsyncLocalStorage<TurnHeld>();
  const holdsTurn = () => inside.getStore()?.held === true;

  const takeTurn = async (): Promise<() => void> => {
    try {
      return await turn.acquire();
    } catch (error) {
      if (error instanceof DatabaseBusyError || error === E_TIMEOUT)
        throw new DatabaseBusyError(`waited over ${options.waitLimitMs} ms for the database; other writes are in progress`);
      throw error;
    }
  };

  const transaction = sequelize.transaction.bind(sequelize) as (o?: unknown, cb?: (t: Transaction) => Promise<unknown>) => Promise<unknown>;
  (sequelize as unknown as { transaction: unknown }).transaction = async (
    first?: unknown,
    second?: (t: Transaction) => Promise<unknown>,
  ): Promise<unknown> => {
    const [opts, callback] = typeof first === "function" ? [undefined, first as (t: Transaction) => Promise<unknown>] : [first, second];
    if (holdsTurn()) return callback ? transaction(opts, callback) : transaction(opts);
    const release = await takeTurn();
    if (callback) {
      const state: TurnHeld = { held: true };
      try {
        return await inside.run(state, () => transaction(opts, callback));
      } catch (error) {
        throw asBusy(error);
      } finally {
        state.held = false;
        release();
      }
    }
    // Unmanaged transaction: the turn is released when it commits or rolls back.
    let open: Transaction;
    try {
      open = (await transaction(opts)) as Transaction;
    } catch (error) {
      release();
      throw asBusy(error);
    }
    let released = false;
    const releaseOnce = () => {
      if (!released) release();
      released = true;
    };
    const commit = open.commit.bind(open);
    const rollback = open.rollback.bind(open);
    open.commit = async () => {
      try {
        await commit();
      } finally {
        releaseOnce();
      }
    };
    open.rollback = async () => {
      try {
        await rollback();
      } finally {
        releaseOnce();
      }
    };
    return open;
  };

  const query = sequelize.query.bind(sequelize) as (sql: unknown, o?: { transaction?: unknown; type?: string }) => Promise<unknown>;
  (sequelize as unknown as { query: unknown }).query = async (sql: unknown, opts?: { transaction?: unknown; type?: string }) => {
    if (opts?.transaction || holdsTurn() || !isWrite(sql, opts?.type)) return query(sql, opts);
    const release = await takeTurn();
    try {
      return await query(sql, opts);
    } catch (error) {
      throw asBusy(error);
    } finally {
      release();
    }
  };
}

function isWrite(sql: unknown, type: string | undefined): boolean {
  if (type && WRITE_QUERY_TYPES.has(type)) return true;
  const text = typeof sql === "string" ? sql : typeof (sql as { query?: unknown })?.query === "string" ? (sql as { query: string }).query : "";
  return WRITE_STATEMENT.test(text);
}

/** SQLITE_BUSY after the busy timeout (Sequelize's TimeoutError) becomes a DatabaseBusyError. */
export function asBusy(error: unknown): unknown {
  if (error instanceof DatabaseBusyError) return error;
  const e = error as { name?: string; parent?: { code?: string }; original?: { code?: string }; code?: string } | null;
  const code = e?.parent?.code ?? e?.original?.code ?? e?.code;
  if (e?.name === "SequelizeTimeoutError" || code === "SQLITE_BUSY" || code === "SQLITE_LOCKED") {
    return new DatabaseBusyError("the database file is locked by another process");
  }
  return error;
}
