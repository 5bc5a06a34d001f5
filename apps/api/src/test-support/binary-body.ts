import type request from "supertest";

/** supertest parser that keeps a response body as raw bytes (workbooks): `.buffer(true).parse(binaryBody)`. */
export function binaryBody(res: request.Response, cb: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on("data", (c: Buffer) => chunks.push(c));
  res.on("end", () => cb(null, Buffer.concat(chunks)));
}
