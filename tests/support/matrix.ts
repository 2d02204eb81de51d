// The role × action matrix (issue 4): every server action and route handler, called as each role, as a
// signed-out visitor and as a member of another shop. Each issue adds its rows in
// tests/support/matrix-cases/<domain>.ts and one spread line in MATRIX_CASES below;
// tests/integration/role-matrix.test.ts runs them all.
import type { Role } from "@/shared/auth/roles";
import type { TestShop } from "./fixtures";
import { authMatrixCases } from "./matrix-cases/auth";
import { plansMatrixCases } from "./matrix-cases/plans";
import { jobsMatrixCases } from "./matrix-cases/jobs";
import { floorMatrixCases } from "./matrix-cases/floor";
import { learningMatrixCases } from "./matrix-cases/learning";
import { recordsMatrixCases } from "./matrix-cases/records";
import { billingMatrixCases } from "./matrix-cases/billing";

/** What a caller got: allowed, or the status it was refused with. */
export type Outcome = "allowed" | 400 | 401 | 403 | 404 | 409 | 429 | 500;

export type Caller = Role | "signed-out" | "other-shop";
export const CALLERS: Caller[] = ["owner", "lead", "machinist", "apprentice", "signed-out", "other-shop"];

export type MatrixContext = {
  /** The shop whose rows are targeted. */
  shop: TestShop;
  /** A second shop; "other-shop" calls are made as its owner. */
  otherShop: TestShop;
  /** The user id of whoever is calling (null when signed out). */
  callerUserId: string | null;
};

export type MatrixCase = {
  /** e.g. "action settings.changeRole" or "GET /api/settings/members". */
  name: string;
  /** Roles of `shop` that are allowed; the others must get 403. */
  allowed: Role[];
  /** What the owner of another shop gets: 404 for a row of `shop`, "allowed" when it acts on its own shop. */
  otherShop: Outcome;
  /** Makes the target rows (fresh for every call) and performs the call with the current session. */
  call: (context: MatrixContext) => Promise<Outcome>;
};

export const MATRIX_CASES: MatrixCase[] = [...authMatrixCases, ...plansMatrixCases, ...jobsMatrixCases, ...floorMatrixCases, ...learningMatrixCases, ...recordsMatrixCases, ...billingMatrixCases];

export function expectedOutcome(testCase: MatrixCase, caller: Caller): Outcome {
  if (caller === "signed-out") return 401;
  if (caller === "other-shop") return testCase.otherShop;
  return testCase.allowed.includes(caller) ? "allowed" : 403;
}

// Messages thrown by requireActor (current.ts), the guards (guard.ts) and the floor's reading guard
// (jobs/access.ts assertMayEnterReadings), which ActionResult carries
// without a status; anything else is reported as-is so a wrong answer is readable in the diff.
const MESSAGE_STATUS: Array<[RegExp, Outcome]> = [
  [/^Please sign in/, 401],
  [/^Your role in this shop does not allow that/, 403],
  [/^This cylinder is not assigned to you|^Your role may enter only checkpoint and final readings/, 403],
  [/was not found\.$/, 404],
];

/** The outcome of a server action's ActionResult. */
export function actionOutcome(result: { ok: boolean; message?: string }): Outcome | string {
  if (result.ok) return "allowed";
  for (const [pattern, outcome] of MESSAGE_STATUS) if (pattern.test(result.message ?? "")) return outcome;
  return `refused: ${result.message}`;
}

/** The outcome of a route handler's Response. */
export function routeOutcome(response: Response): Outcome {
  return response.ok ? "allowed" : (response.status as Outcome);
}
