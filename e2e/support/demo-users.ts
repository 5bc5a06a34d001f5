/**
 * The demo sign-ins the seed creates (seeds/src/users.ts; `pnpm start` prints the same table).
 * Repeated here, not imported, because Playwright loads the specs before the server (and its
 * build of the seeds package) exists on a fresh clone.
 */
export const demoUsers = {
  analyst: { email: "analyst@harbourline.example", password: "plume-demo-analyst", name: "Ines Calloway" },
  actuary: { email: "actuary@harbourline.example", password: "plume-demo-actuary", name: "Tobias Wrenfield" },
  manager: { email: "manager@harbourline.example", password: "plume-demo-manager", name: "Marit Oyelaran" },
  manager2: { email: "manager2@harbourline.example", password: "plume-demo-manager2", name: "Desmond Achterberg" },
  admin: { email: "admin@harbourline.example", password: "plume-demo-admin", name: "Ruth Penhallow" },
} as const;

export type DemoUserKey = keyof typeof demoUsers;
