import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { pathwaysController } from "./pathways.controller.js";
import { pathwaysInputs as input } from "./pathways.inputs.js";
import { singleFileUpload } from "../../uploads/single-file-upload.js";

/** Largest pathway file accepted: 1000 years x 12 columns is far below this (413 above it). */
export const MAX_PATHWAY_UPLOAD_BYTES = 2 * 1024 * 1024;

const upload = singleFileUpload("file", MAX_PATHWAY_UPLOAD_BYTES);

export const pathwaysRouter: Router = Router();

pathwaysRouter.get("/", authenticate, requirePermission("pathways:read"), validate(input.list), pathwaysController.list);
pathwaysRouter.post(
  "/upload",
  authenticate,
  requirePermission("pathways:write"),
  upload,
  validate(input.upload),
  pathwaysController.upload,
);
pathwaysRouter.get("/:id", authenticate, requirePermission("pathways:read"), validate(input.byId), pathwaysController.get);
pathwaysRouter.post("/", authenticate, requirePermission("pathways:write"), validate(input.create), pathwaysController.create);
pathwaysRouter.patch("/:id", authenticate, requirePermission("pathways:write"), validate(input.update), pathwaysController.update);
