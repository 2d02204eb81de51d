import "server-only";
import { isStoneInReleasedPlan as stoneInReleasedPlan } from "@/server/plans/queries";

/**
 * Whether a released plan uses this stone set; such a stone may not be retired. The query over
 * released plans' stages belongs to the plans domain (issue 7); this seam is what the stone
 * mutations call and what tests stub.
 */
export async function isStoneInReleasedPlan(shopId: string, stoneId: string): Promise<boolean> {
  return stoneInReleasedPlan(shopId, stoneId);
}
