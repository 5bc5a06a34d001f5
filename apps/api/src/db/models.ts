import type { Sequelize } from "sequelize";
import { initAccountModel } from "../auth/account.model.js";
import { initSessionModel } from "../auth/session.model.js";
import { initVerificationModel } from "../auth/verification.model.js";
import { initAuditEventModel } from "../modules/audit/audit-event.model.js";
import { initOutboxMessageModel } from "../modules/outbox/outbox-message.model.js";
import { initUserModel } from "../modules/users/user.model.js";
import { initPathwayModel } from "../modules/pathways/pathway.model.js";
import { initModelVersionModel } from "../modules/model-versions/model-version.model.js";
import { initRunModel } from "../modules/runs/run.model.js";
import { initJobModel } from "../queue/job.model.js";
import { initRunReplayModel } from "../modules/runs/run-replay.model.js";
import { initRunResultModel } from "../modules/results/run-result.model.js";
import { initExportRecordModel } from "../modules/exports/export-record.model.js";
import { initRunStatementModel } from "../modules/run-statements/run-statement.model.js";
import { initPerilProfileModel } from "../modules/peril-profiles/peril-profile.model.js";
import { initPortfolioModel } from "../modules/portfolios/portfolio.model.js";
import { initSettingModel } from "../modules/settings/setting.model.js";

/**
 * Registers every module's model on this Sequelize instance. Model classes bind to the
 * instance they were last initialised with, so a process keeps one open context at a time.
 * Add one line per model (and associations below); the schema itself comes from migrations.
 */
export function initModels(sequelize: Sequelize) {
  const models = {
    // foundation
    User: initUserModel(sequelize),
    Session: initSessionModel(sequelize),
    Account: initAccountModel(sequelize),
    Verification: initVerificationModel(sequelize),
    AuditEvent: initAuditEventModel(sequelize),
    OutboxMessage: initOutboxMessageModel(sequelize),
    Setting: initSettingModel(sequelize),
    // domain (pathways, model versions, runs, jobs, results, exports)
    Pathway: initPathwayModel(sequelize),
    ModelVersion: initModelVersionModel(sequelize),
    Run: initRunModel(sequelize),
    RunReplay: initRunReplayModel(sequelize),
    Job: initJobModel(sequelize),
    RunResult: initRunResultModel(sequelize),
    ExportRecord: initExportRecordModel(sequelize),
    RunStatement: initRunStatementModel(sequelize),
    // peril (peril profiles, portfolios)
    PerilProfile: initPerilProfileModel(sequelize),
    Portfolio: initPortfolioModel(sequelize),
  };
  return models;
}

export type Models = ReturnType<typeof initModels>;
