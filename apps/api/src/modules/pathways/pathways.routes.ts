import { createPathwayBodySchema, listPathwaysQuerySchema, updatePathwayBodySchema } from "@plumeline/contracts";
import { Router } from "express";
import { z } from "zod";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { pathwaysController } from "./pathways.controller.js";
import { singleFileUpload } from "../../uploads/single-file-upload.js";

/** Largest pathway file accepted: 1000 years x 12 columns is far below this (413 above it). */
export const MAX_PATHWAY_UPLOAD_BYTES = 2 * 1024 * 1024;

const upload = singleFileUpload("file", MAX_PATHWAY_UPLOAD_BYTES);
const idParams = z.object({ id: z.string().min(1) });

export const pathwaysRouter: Router = Router();

pathwaysRouter.get("/", authenticate, requirePermission("pathways:read"), validate({ query: listPathwaysQuerySchema }), pathwaysController.list);
pathwaysRouter.post("/upload", authenticate, requirePermission("pathways:write"), upload, pathwaysController.upload);
pathwaysRouter.get("/:id", authenticate, requirePermission("pathways:read"), validate({ params: idParams }), pathwaysController.get);
pathwaysRouter.post("/", authenticate, requirePermission("pathways:write"), validate({ body: createPathwayBodySchema }), pathwaysController.create);
pathwaysRouter.patch(
  "/:id",
  authenticate,
  requirePermission("pathways:write"),
  validate({ params: idParams, body: updatePathwayBodySchema }),
  pathwaysController.update,
);
