import { mkdtemp, readFile, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ConfigError, loadConfig, repoRoot } from "./config.js";

let dataDir: string;
beforeAll(async () => {
  dataDir = await mkdtemp(path.join(os.tmpdir(), "plumeline-config-"));
});
afterAll(async () => {
  await rm(dataDir, { recursive: true, force: true });
});

describe("loadConfig", () => {
  it("starts with no configuration: port 4000, embedded mail, sqlite queue, a secret kept in the data folder", async () => {
    const config = loadConfig({ PLUMELINE_DATA_DIR: dataDir });
    expect(config.port).toBe(4000);
    expect(config.databaseFile).toBe(path.join(dataDir, "plumeline.db"));
    expect(config.smtpUrl).toBeUndefined();
    expect(config.queue).toBe("sqlite");
    expect(config.workers).toBeGreaterThanOrEqual(1);
    expect(config.webDist).toBe(path.join(repoRoot, "apps/web/dist"));
    expect(config.authSecret.length).toBeGreaterThanOrEqual(32);
    expect(await readFile(path.join(dataDir, "auth-secret"), "utf8")).toBe(config.authSecret);
    // Second start reads the same secret, so sessions survive a restart.
    expect(loadConfig({ PLUMELINE_DATA_DIR: dataDir }).authSecret).toBe(config.authSecret);
    expect(config.trustedOrigins).toContain("http://localhost:4000");
  });

  it("fails fast naming every bad variable", () => {
    let caught: unknown;
    try {
      loadConfig({ PLUMELINE_DATA_DIR: dataDir, PORT: "eighty", SMTP_URL: "not a url", AUTH_SECRET: "short" });
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(ConfigError);
    const message = (caught as Error).message;
    for (const name of ["PORT", "SMTP_URL", "AUTH_SECRET"]) expect(message).toContain(name);
  });

  it("requires REDIS_URL for the bullmq queue and takes extra trusted origins", () => {
    expect(() => loadConfig({ PLUMELINE_DATA_DIR: dataDir, QUEUE: "bullmq" })).toThrow(/REDIS_URL/);
    const config = loadConfig({ PLUMELINE_DATA_DIR: dataDir, PUBLIC_ORIGIN: "https://risk.harbourline.example/", TRUSTED_ORIGINS: "https://a.example, https://b.example" });
    expect(config.publicOrigin).toBe("https://risk.harbourline.example");
    expect(config.trustedOrigins).toEqual(expect.arrayContaining(["https://risk.harbourline.example", "https://a.example", "https://b.example"]));
  });
});
