import type { DemoUser } from "@plumeline/seeds";
import type { Express } from "express";
import request from "supertest";
import { demoUser, TEST_ORIGIN } from "./test-context.js";

export type SignedInAgent = ReturnType<typeof request.agent>;

/**
 * Signs a seeded user in through the real better-auth endpoint and returns a supertest agent
 * that keeps the session cookie and sends a trusted Origin on every request.
 * `await signIn(app, "manager2")` then `agent.post("/api/…").send({…})`.
 */
export async function signIn(app: Express, key: DemoUser["key"]): Promise<SignedInAgent> {
  const user = demoUser(key);
  const agent = request.agent(app);
  agent.set("Origin", TEST_ORIGIN);
  const res = await agent.post("/api/auth/sign-in/email").send({ email: user.email, password: user.password });
  if (res.status !== 200) throw new Error(`Sign-in as ${key} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}
