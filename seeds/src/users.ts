import type { Role } from "@plumeline/contracts";
import { demoOrganisation } from "./organisation.js";

export interface DemoUser {
  /** Stable key other seed files use to name an author (e.g. a model version's author). */
  key: "analyst" | "actuary" | "manager" | "manager2" | "admin";
  email: string;
  name: string;
  role: Role;
  /** Demo only: printed by `pnpm start` and listed in the README. */
  password: string;
}

const at = (local: string) => `${local}@${demoOrganisation.mailDomain}`;

/**
 * One user per role, plus a second manager so a version drafted by one can be approved by
 * another (nobody decides their own). Passwords are public demo values: change them (or
 * start with an empty data folder and SEED_DEMO=false) before any real use.
 */
export const demoUsers: readonly DemoUser[] = [
  { key: "analyst", email: at("analyst"), name: "Ines Calloway", role: "analyst", password: "plume-demo-analyst" },
  { key: "actuary", email: at("actuary"), name: "Tobias Wrenfield", role: "actuary", password: "plume-demo-actuary" },
  { key: "manager", email: at("manager"), name: "Marit Oyelaran", role: "manager", password: "plume-demo-manager" },
  { key: "manager2", email: at("manager2"), name: "Desmond Achterberg", role: "manager", password: "plume-demo-manager2" },
  { key: "admin", email: at("admin"), name: "Ruth Penhallow", role: "admin", password: "plume-demo-admin" },
];
