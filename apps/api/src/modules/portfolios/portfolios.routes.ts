import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { portfoliosController as c } from "./portfolios.controller.js";
import { portfoliosInputs as input } from "./portfolios.inputs.js";
import { singleFileUpload } from "../../uploads/single-file-upload.js";

/** Largest portfolio file accepted (5000 rows of six columns fit in well under this; 413 above). */
export const MAX_PORTFOLIO_UPLOAD_BYTES = 1024 * 1024;

const upload = singleFileUpload("file", MAX_PORTFOLIO_UPLOAD_BYTES);

export const portfoliosRouter: Router = Router();

portfoliosRouter.get("/", authenticate, requirePermission("perils:read"), c.list);
portfoliosRouter.post("/upload", authenticate, requirePermission("perils:write"), upload, validate(input.upload), c.upload);
portfoliosRouter.get("/:id", authenticate, requirePermission("perils:read"), validate(input.byId), c.get);
