// The roles of a shop member, most trusted first (DESIGN.md §2). The tables, the policy and the forms read this one list.
export const ROLES = ["owner", "lead", "machinist", "apprentice"] as const;
export type Role = (typeof ROLES)[number];
