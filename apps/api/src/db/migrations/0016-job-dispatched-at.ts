import { DataTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";

/**
 * QUEUE=bullmq (apps/api/QUEUE.md): the job row doubles as the outbox row. `dispatched_at` is
 * null until the job has been published to BullMQ after its transaction committed; a sweep
 * publishes every queued row still null, so a crash between commit and publish loses nothing.
 * QUEUE=sqlite ignores the column.
 */
export const up: MigrationModule["up"] = async ({ queryInterface }) => {
  await queryInterface.addColumn("jobs", "dispatched_at", { type: DataTypes.DATE, allowNull: true });
  await queryInterface.addIndex("jobs", ["status", "dispatched_at"]);
};

export const down: MigrationModule["down"] = async ({ queryInterface }) => {
  await queryInterface.removeIndex("jobs", ["status", "dispatched_at"]);
  await queryInterface.removeColumn("jobs", "dispatched_at");
};
