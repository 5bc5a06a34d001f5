import { gunzipSync, gzipSync } from "node:zlib";
import { DataTypes, QueryTypes } from "sequelize";
import type { MigrationModule } from "../migrate.js";
import { up as createResultTables } from "./0014-run-results.js";

/**
 * A run's result becomes ONE compressed document (gzip of the engine's RunResult JSON) instead
 * of a JSON text plus one row per (pathway, variable, year, statistic). Nothing queried those
 * rows, and writing them held SQLite's single write lock for as long as the rows took (a run
 * with thousands of thresholds wrote millions of rows in one transaction while every other
 * writer waited). Now a result is one short insert; the API serves the stored gzip bytes as
 * they are to clients that accept gzip. Existing results are carried over, compressed.
 */
export const up: MigrationModule["up"] = async ({ queryInterface, sequelize }) => {
  await queryInterface.createTable("run_result_documents", {
    run_id: { type: DataTypes.STRING, primaryKey: true, allowNull: false, references: { model: "runs", key: "id" }, onDelete: "CASCADE" },
    engine_version: { type: DataTypes.STRING, allowNull: false },
    input_hash: { type: DataTypes.STRING, allowNull: false },
    result_hash: { type: DataTypes.STRING, allowNull: false },
    /** How `document` is encoded; "gzip-json" = gzip (RFC 1952) of the RunResult as UTF-8 JSON. */
    encoding: { type: DataTypes.STRING, allowNull: false },
    /** Length of the uncompressed JSON in bytes (for diagnostics and size reports). */
    json_bytes: { type: DataTypes.INTEGER, allowNull: false },
    document: { type: DataTypes.BLOB, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  const old = await sequelize.query<{ run_id: string; engine_version: string; input_hash: string; result_hash: string; result: string; created_at: string }>(
    "SELECT run_id, engine_version, input_hash, result_hash, result, created_at FROM run_results",
    { type: QueryTypes.SELECT },
  );
  for (const row of old) {
    const json = Buffer.from(row.result, "utf8");
    await sequelize.query(
      "INSERT INTO run_result_documents (run_id, engine_version, input_hash, result_hash, encoding, json_bytes, document, created_at) VALUES (?, ?, ?, ?, 'gzip-json', ?, ?, ?)",
      { replacements: [row.run_id, row.engine_version, row.input_hash, row.result_hash, json.length, gzipSync(json), row.created_at] },
    );
  }
  await queryInterface.dropTable("run_result_rows");
  await queryInterface.dropTable("run_results");
};

/**
 * Back to JSON text per run: every document is unpacked into run_results. The per-year rows
 * come back as an empty table — nothing ever read them, and the JSON holds every number.
 */
export const down: MigrationModule["down"] = async (context) => {
  const { queryInterface, sequelize } = context;
  await createResultTables(context);
  const documents = await sequelize.query<{ run_id: string; engine_version: string; input_hash: string; result_hash: string; document: Buffer; created_at: string }>(
    "SELECT run_id, engine_version, input_hash, result_hash, document, created_at FROM run_result_documents",
    { type: QueryTypes.SELECT },
  );
  for (const row of documents) {
    await sequelize.query(
      "INSERT INTO run_results (run_id, engine_version, input_hash, result_hash, result, created_at) VALUES (?, ?, ?, ?, ?, ?)",
      { replacements: [row.run_id, row.engine_version, row.input_hash, row.result_hash, gunzipSync(row.document).toString("utf8"), row.created_at] },
    );
  }
  await queryInterface.dropTable("run_result_documents");
};
