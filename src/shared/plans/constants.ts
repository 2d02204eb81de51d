// Names of the plans domain, shared by the tables, the zod schemas and the screens.
export const PLAN_STATUSES = ["draft", "released", "done", "withdrawn"] as const;
export type PlanStatus = (typeof PLAN_STATUSES)[number];

export const PLAN_STATUS_LABELS: Record<PlanStatus, string> = {
  draft: "Draft",
  released: "Released",
  done: "Done",
  withdrawn: "Withdrawn",
};

export const STAGE_KINDS = ["bore", "coarse", "finish", "plateau"] as const;
export type StageKind = (typeof STAGE_KINDS)[number];

export const BORE_BASES = ["readings", "diameter", "stock"] as const;
export type BoreBasis = (typeof BORE_BASES)[number];
