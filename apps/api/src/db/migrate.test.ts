import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { QueryTypes } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase } from "./database.js";
import { createMigrator, migrate } from "./migrate.js";

let dir: string;
beforeAll(async () => {
  dir = await mkdtemp(path.join(os.tmpdir(), "plumeline-migrate-"));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

async function tableNames(file: string): Promise<string[]> {
  const db = await openDatabase(file);
  const [rows] = await db.query("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name");
  await db.close();
  return (rows as Array<{ name: string }>).map((r) => r.name);
}

describe("migrations", () => {
  it("build the schema from an empty file, and a second run applies nothing", async () => {
    const file = path.join(dir, "twice.db");
    const db = await openDatabase(file);
    const first = await migrate(db);
    expect(first.slice(0, 3)).toEqual(["0001-auth-tables", "0002-audit-events", "0003-outbox-messages"]);
    expect(await migrate(db)).toEqual([]);
    await db.close();
    // Reopening the file (a restart) also finds nothing to do.
    const again = await openDatabase(file);
    expect(await migrate(again)).toEqual([]);
    await again.close();
    expect(await tableNames(file)).toEqual(expect.arrayContaining(["users", "sessions", "accounts", "verifications", "audit_events", "outbox_messages", "schema_migrations"]));
  });

  it("apply in the same order on a second empty file, and roll back to empty and forward again", async () => {
    const file = path.join(dir, "roundtrip.db");
    const db = await openDatabase(file);
    const names = await migrate(db);
    const sorted = [...names].sort();
    expect(names).toEqual(sorted);
    await createMigrator(db).down({ to: 0 });
    const [left] = await db.query("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT IN ('schema_migrations') AND name NOT LIKE 'sqlite_%'");
    expect(left).toEqual([]);
    expect(await migrate(db)).toEqual(names);
    await db.close();
  });

  it("open the file in WAL mode with foreign keys and a busy timeout", async () => {
    const db = await openDatabase(path.join(dir, "pragmas.db"));
    const [journal] = await db.query<{ journal_mode: string }>("PRAGMA journal_mode", { type: QueryTypes.SELECT });
    const [keys] = await db.query<{ foreign_keys: number }>("PRAGMA foreign_keys", { type: QueryTypes.SELECT });
    const [busy] = await db.query<{ timeout: number }>("PRAGMA busy_timeout", { type: QueryTypes.SELECT });
    expect(journal?.journal_mode).toBe("wal");
    expect(keys?.foreign_keys).toBe(1);
    expect(busy?.timeout).toBe(5000);
    // A transaction runs on its own connection; it must get the same settings.
    await db.transaction(async (transaction) => {
      const [inner] = await db.query<{ timeout: number }>("PRAGMA busy_timeout", { type: QueryTypes.SELECT, transaction });
      expect(inner?.timeout).toBe(5000);
    });
    await db.close();
  });
});
