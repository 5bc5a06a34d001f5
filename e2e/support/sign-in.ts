import { expect, request, type APIRequestContext, type Page } from "@playwright/test";
import { demoUsers, type DemoUserKey } from "./demo-users";

/** Signs in through the sign-in page, as a person would, and waits for the desk. */
export async function signIn(page: Page, who: DemoUserKey): Promise<void> {
  const user = demoUsers[who];
  await page.goto("/sign-in");
  await page.getByLabel("Email").fill(user.email);
  await page.getByLabel("Password").fill(user.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toContainText(user.name.split(" ")[0]!);
}

/**
 * An API client signed in as a demo user (cookie session), for setting up or checking data
 * the browser flow does not itself show. better-auth wants a trusted Origin on POSTs.
 */
export async function apiAs(who: DemoUserKey, baseURL: string): Promise<APIRequestContext> {
  const api = await request.newContext({ baseURL, extraHTTPHeaders: { Origin: baseURL } });
  const res = await api.post("/api/auth/sign-in/email", { data: { email: demoUsers[who].email, password: demoUsers[who].password } });
  expect(res.status(), `sign-in of ${who}`).toBe(200);
  return api;
}

/** GET that must succeed, parsed as JSON. */
export async function getJson<T>(api: APIRequestContext, url: string): Promise<T> {
  const res = await api.get(url);
  expect(res.status(), `GET ${url}: ${await res.text()}`).toBe(200);
  return (await res.json()) as T;
}

/** POST that must succeed, parsed as JSON. */
export async function postJson<T>(api: APIRequestContext, url: string, data: unknown): Promise<T> {
  const res = await api.post(url, { data });
  expect(res.ok(), `POST ${url}: ${res.status()} ${await res.text()}`).toBe(true);
  return (await res.json()) as T;
}
