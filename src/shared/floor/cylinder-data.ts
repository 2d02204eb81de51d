import type { CylinderVerdict, FinalCheck, FinishedBore, PlanStage } from "@/lib/honing";
import type { CardUnits, StepCard } from "./cards";
import type { BoreMaterialCode } from "./outcome";
import type { FloorSettings } from "@/shared/shop-settings/floor-schema";

/** What the server hands the step cards of one cylinder (all plain data). */
export type FloorCylinderData = {
  planId: string;
  cylinder: number;
  heading: string;
  boreMaterial: BoreMaterialCode;
  levelNames: string[];
  stages: PlanStage[];
  finalCheck: FinalCheck;
  sizing: Pick<FinishedBore, "minUm" | "maxUm" | "pistonDiameterUm" | "clearanceMinUm" | "clearanceMaxUm">;
  cards: StepCard[];
  /** The card to start on when the device has nothing of its own for this cylinder. */
  startIndex: number;
  /** Full-stroke strokes the server has logged per stage position. */
  loggedStrokes: Record<number, number>;
  stopped: boolean;
  verdict: CylinderVerdict | null;
  units: CardUnits;
  mayLog: boolean;
  /** The shop's: how warm the block may be for a verdict, and the gauge temperature filled in on reading cards. */
  floorSettings: FloorSettings;
  /** Why the cylinder was stopped (the stored re-estimate's reason), when it was. */
  stopNote: string | null;
};
