import { Router } from "express";
import { authenticateAllowingPasswordChange } from "../../middleware/authenticate.js";
import { meController } from "./me.controller.js";

export const meRouter = Router();

// An invited user on the mailed password may still ask who they are (the web app then shows the password form).
meRouter.get("/", authenticateAllowingPasswordChange, meController.show);
