import type { Role } from "./roles";

// The single source of truth for who may do what (DESIGN.md §2). The UI asks can*(), every server
// action and route handler asserts. Roles nest: owner ⊃ lead ⊃ machinist ⊃ apprentice.
const APPRENTICE = [
  "jobs.view",
  "stones.view",
  "machines.view",
  "plans.view",
  "floor.view",
  "readings.enterOnFloor",
  "runs.log",
  "attachments.view",
] as const;

const MACHINIST = [
  ...APPRENTICE,
  "customers.viewContact",
  "customers.edit",
  "jobs.create",
  "jobs.edit",
  "jobs.setStatus",
  "readings.edit",
  "pistons.edit",
  "attachments.upload",
  "plans.create",
  "records.send",
  "billing.view",
  "quotes.edit",
  "invoices.edit",
  "runs.view",
] as const;

const LEAD = [...MACHINIST, "stones.edit", "machines.edit", "rates.adopt", "plans.release", "plans.withdraw", "invoices.issue", "floor.settings"] as const;

const OWNER = [...LEAD, "members.view", "members.manage", "shop.edit", "jobs.delete", "billing.settings"] as const;

export type Permission = (typeof OWNER)[number];

export const POLICY: Record<Role, readonly Permission[]> = {
  owner: OWNER,
  lead: LEAD,
  machinist: MACHINIST,
  apprentice: APPRENTICE,
};

/** Who is acting: a signed-in user inside one of their shops. */
export type Actor = { userId: string; shopId: string; role: Role };

export function can(actor: Pick<Actor, "role"> | null | undefined, permission: Permission): boolean {
  return actor != null && POLICY[actor.role].includes(permission);
}
