import { mkdirSync } from "node:fs";
import path from "node:path";
import { Sequelize, Transaction } from "sequelize";
import { serializeWrites } from "./serialize-writes.js";

/** How long SQLite itself waits for a lock held by another process before SQLITE_BUSY. */
const BUSY_TIMEOUT_MS = 5000;
/** How long a write waits for its turn in this process before the request gets a 503. */
export const WRITE_WAIT_LIMIT_MS = 30_000;

interface RawSqliteConnection {
  configure(option: "busyTimeout", value: number): void;
}

/**
 * Opens the SQLite file through Sequelize: WAL journal (readers never block the writer),
 * a busy timeout, foreign keys on, IMMEDIATE transactions (take the write lock up front, so
 * two writers queue on the busy timeout instead of failing on a lock upgrade), logging off.
 * Writes of this process take turns (serialize-writes.ts); only another process's lock is
 * waited out on SQLite's busy timeout.
 */
export async function openDatabase(file: string): Promise<Sequelize> {
  if (file !== ":memory:") mkdirSync(path.dirname(file), { recursive: true });
  const sequelize = new Sequelize({
    dialect: "sqlite",
    storage: file,
    logging: false,
    transactionType: Transaction.TYPES.IMMEDIATE,
    // Sequelize retries SQLITE_BUSY five times by default, on top of the busy timeout (25 s and
    // more); one retry is enough, after which the request gets a 503 rather than hanging.
    retry: { max: 2, match: ["SQLITE_BUSY: database is locked"] },
    define: { underscored: true },
  });
  configureEveryConnection(sequelize);
  serializeWrites(sequelize, { waitLimitMs: WRITE_WAIT_LIMIT_MS });
  await sequelize.query("PRAGMA journal_mode = WAL");
  await sequelize.query("PRAGMA synchronous = NORMAL");
  return sequelize;
}

/**
 * Sequelize's sqlite dialect opens a fresh connection per transaction and skips the
 * afterConnect hook, so the busy timeout is applied here on each new raw connection.
 * (Foreign keys are switched on by Sequelize itself for every connection.)
 */
function configureEveryConnection(sequelize: Sequelize): void {
  const manager = (sequelize as unknown as { connectionManager: { getConnection(options?: unknown): Promise<RawSqliteConnection> } }).connectionManager;
  const open = manager.getConnection.bind(manager);
  const configured = new WeakSet<RawSqliteConnection>();
  manager.getConnection = async (options?: unknown) => {
    const connection = await open(options);
    if (!configured.has(connection)) {
      connection.configure("busyTimeout", BUSY_TIMEOUT_MS);
      configured.add(connection);
    }
    return connection;
  };
}
