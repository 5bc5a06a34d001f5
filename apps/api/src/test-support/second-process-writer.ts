/**
 * A second process on the same SQLite file, for the concurrency tests (never shipped code).
 *   hold <file> <ms>    takes the write lock (BEGIN IMMEDIATE), prints "locked", holds it <ms>, commits
 *   burst <file> <n>    appends <n> audit rows at once through openDatabase, prints "done <ok> <failed>"
 * It talks to the file as another server process would: its own connections, its own lock waits.
 */
import { openDatabase } from "../db/database.js";
import { initModels } from "../db/models.js";
import { recordAudit } from "../modules/audit/audit.service.js";

const [mode, file, amount] = process.argv.slice(2);
if (!mode || !file || !amount) throw new Error("usage: second-process-writer hold|burst <file> <ms|count>");
const sequelize = await openDatabase(file);

if (mode === "hold") {
  const transaction = await sequelize.transaction();
  await sequelize.query("INSERT INTO audit_events (action, entity_type, summary, created_at) VALUES ('test.lock-held', 'test', 'held by a second process', CURRENT_TIMESTAMP)", { transaction });
  process.stdout.write("locked\n");
  await new Promise((resolve) => setTimeout(resolve, Number(amount)));
  await transaction.commit();
} else {
  const models = initModels(sequelize);
  const outcomes = await Promise.allSettled(
    Array.from({ length: Number(amount) }, (_, i) =>
      sequelize.transaction((transaction) =>
        recordAudit({ models }, { actorId: null, action: "test.second-process", entityType: "test", entityId: i, summary: `write ${i} from a second process` }, transaction),
      ),
    ),
  );
  const failed = outcomes.filter((o) => o.status === "rejected");
  for (const f of failed) process.stderr.write(`${String((f).reason)}\n`);
  process.stdout.write(`done ${outcomes.length - failed.length} ${failed.length}\n`);
}
await sequelize.close();
