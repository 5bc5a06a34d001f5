import type { RequestHandler } from "express";
import multer from "multer";

/** The multipart body itself is broken (no boundary, cut short, bad part header). */
export class MalformedMultipartError extends Error {
  override name = "MalformedMultipartError";
}

/**
 * multer's single-file upload (kept in memory, `maxBytes` at most, one file, ten fields) with
 * its parser failures told apart: multer's own limit errors pass on (413), while anything the
 * multipart parser throws (busboy: "Boundary not found", "Unexpected end of form", …) is the
 * client's malformed body and becomes MalformedMultipartError (400), not a 500.
 */
export function singleFileUpload(field: string, maxBytes: number): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 10 } }).single(field);
  return (req, res, next) => {
    upload(req, res, (error?: unknown) => {
      if (!error || error instanceof multer.MulterError) { next(error); return; }
      next(new MalformedMultipartError((error as Error).message.replace(/^Multipart: /, "").replace(/\.$/, "").toLowerCase()));
    });
  };
}
