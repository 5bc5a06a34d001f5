import type { RequestHandler } from "express";
import { AppError } from "../errors/app-error.js";

/** NUL and the other C0 controls (tab, CR and LF allowed in body text) and DEL. */
// eslint-disable-next-line no-control-regex -- matching NUL and the other C0 controls is the point
const CONTROL_IN_PATH = /[\u0000-\u001f\u007f]/;
// eslint-disable-next-line no-control-regex -- matching NUL and the other C0 controls is the point
const CONTROL_IN_TEXT = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;

function describe(text: string): string {
  const code = text.match(CONTROL_IN_TEXT)?.[0] ?? text.match(CONTROL_IN_PATH)?.[0] ?? "";
  return code === "\u0000" ? "NUL" : `U+${code.charCodeAt(0).toString(16).toUpperCase().padStart(4, "0")}`;
}

/** Dotted paths of body strings holding a control character (ids included), at most a few. */
function controlCharacterPaths(value: unknown, path: string, out: Array<{ path: string; message: string }>): void {
  if (out.length >= 10) return;
  if (typeof value === "string") {
    if (CONTROL_IN_TEXT.test(value)) out.push({ path: path || "body", message: `contains a control character (${describe(value)})` });
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => controlCharacterPaths(v, `${path}[${i}]`, out));
  } else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) controlCharacterPaths(v, path ? `${path}.${k}` : k, out);
  }
}

/**
 * Refuses control characters in the URL path (ids), the query and JSON body strings with 400,
 * once for every endpoint. WHY: Sequelize's SQLite dialect writes values into the SQL text,
 * and a NUL byte ends the statement early, so an id like "abc%00" used to answer 500 with the
 * whole SQL in the log. Ids and names never need them; text fields keep tab and newlines.
 */
export const rejectControlCharacters: RequestHandler = (req, _res, next) => {
  let path: string;
  try {
    path = decodeURIComponent(req.path);
  } catch {
    throw new AppError(400, "invalid_characters", "The URL path is not valid percent-encoding.");
  }
  if (CONTROL_IN_PATH.test(path))
    throw new AppError(400, "invalid_characters", `The URL path contains a control character (${describe(path)}); ids never do.`, [
      { path: "id", message: "contains a control character" },
    ]);
  const details: Array<{ path: string; message: string }> = [];
  for (const [key, value] of Object.entries(req.query ?? {})) controlCharacterPaths(value, key, details);
  controlCharacterPaths(req.body, "", details);
  if (details.length > 0) throw new AppError(400, "validation_failed", "The request has invalid fields.", details);
  next();
};
