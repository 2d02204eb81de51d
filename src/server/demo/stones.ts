import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { machines, stones } from "@/server/db/schema";
import type { Actor } from "@/shared/auth/policy";
import type { BoreMaterial } from "@/lib/bore-materials";
import { createMachine } from "@/server/machines/mutations";
import { createStone } from "@/server/stones/mutations";
import { createRateRow } from "@/server/stones/rate-mutations";
import type { DemoContext } from "./seed";

// Invented demo library. Grits are from the published tables (trade-facts §3.4); removal rates, finishes
// and wear sit inside the ranges of trade-facts §2.4 (stage Ra [C], plateau Rk family [M]), §3.3
// (stage stocks [C]) and §4 (vitrified stones on grey iron G ≈ 5–50 [M]: 0.2–1.7 µm of height per µm
// of diameter stock on a 94 mm × 140 mm bore with four 100 × 6 mm stones [D]).
const NOTE = "Demo data: invented for the demo shop.";
const REASON = "Demo data: initial library";

const MACHINES = [
  { name: "Bay 1 vertical hone (demo)", spindleRpmMin: 80, spindleRpmMax: 400, doubleStrokesPerMinMin: 20, doubleStrokesPerMinMax: 120, maxStrokeLengthUm: 220_000, drive: "constant", pressureUnit: "bar", pressureMin: 2, pressureMax: 25, headStoneLengthUm: 100_000 },
  { name: "Bay 2 crank hone (demo)", spindleRpmMin: 100, spindleRpmMax: 300, doubleStrokesPerMinMin: 30, doubleStrokesPerMinMax: 90, maxStrokeLengthUm: 180_000, drive: "crank", pressureUnit: "bar", pressureMin: 2, pressureMax: 20, headStoneLengthUm: 100_000 },
] as const;

const stone = (code: string, role: string, abrasive: string, grit: string, bond: string, currentHeightUm: number) => ({
  code, role, abrasive, grit, bond, stoneLengthUm: 100_000, stoneWidthUm: 6_000, stonesPerHead: 4,
  startHeightUm: 8_000, wearLimitHeightUm: 2_000, currentHeightUm, notes: NOTE,
});

const STONES = [
  stone("DC-150", "coarse", "silicon_carbide", "F150", "vitrified", 6_400),
  stone("DC-220", "coarse", "aluminium_oxide", "F220", "vitrified", 7_600),
  stone("DF-400", "finish", "silicon_carbide", "JIS #400", "vitrified", 3_000),
  stone("DP-800", "plateau", "silicon_carbide", "JIS #800", "resin", 7_100),
] as const;

type Rate = { removal: number; pressure: number; ra: number; rz: number; rk?: [number, number, number]; cleanup: number | "rz"; wear: number };
// Iron liners (harder centrifugal iron in an aluminium block) take a little less per stroke.
const RATES: Record<string, Record<"grey_iron" | "al_iron_liner", Rate>> = {
  "DC-150": { grey_iron: { removal: 1.6, pressure: 10, ra: 1.8, rz: 12, cleanup: 20, wear: 0.5 }, al_iron_liner: { removal: 1.3, pressure: 10, ra: 1.6, rz: 11, cleanup: 18, wear: 0.6 } },
  "DC-220": { grey_iron: { removal: 1.1, pressure: 9, ra: 1.2, rz: 8.5, cleanup: 12, wear: 0.45 }, al_iron_liner: { removal: 0.9, pressure: 9, ra: 1.1, rz: 8, cleanup: 11, wear: 0.55 } },
  "DF-400": { grey_iron: { removal: 0.45, pressure: 8, ra: 0.6, rz: 4.5, cleanup: 3, wear: 0.3 }, al_iron_liner: { removal: 0.35, pressure: 8, ra: 0.55, rz: 4.2, cleanup: 3, wear: 0.35 } },
  "DP-800": { grey_iron: { removal: 0.12, pressure: 4, ra: 0.35, rz: 3, rk: [0.6, 0.2, 1.4], cleanup: "rz", wear: 0.8 }, al_iron_liner: { removal: 0.1, pressure: 4, ra: 0.3, rz: 2.8, rk: [0.5, 0.15, 1.2], cleanup: "rz", wear: 0.9 } },
};

function rateInput(stoneId: string, boreMaterial: BoreMaterial, r: Rate) {
  return {
    stoneId, boreMaterial, removalPerDoubleStrokeUm: r.removal, referencePressure: r.pressure, referencePressureUnit: "bar",
    referenceBoreLengthUm: 140_000, raUm: r.ra, rzUm: r.rz, rkUm: r.rk?.[0], rpkUm: r.rk?.[1], rvkUm: r.rk?.[2],
    cleanupMode: r.cleanup === "rz" ? "from_rz" : "explicit", cleanupStockUm: r.cleanup === "rz" ? undefined : r.cleanup,
    cleanupRzMultiple: r.cleanup === "rz" ? 3 : undefined, wearUmPerUmStock: r.wear, uncertaintyFraction: 0.25, source: "demo", notes: NOTE,
  };
}

/** Adds the demo shop's machines, stone sets and rate rows, written by the demo lead so history shows who. */
export async function seedDemoStones(context: DemoContext): Promise<void> {
  const userId = context.userIdsByRole.lead ?? context.userIdsByRole.owner;
  if (!context.shopId || !userId) throw new Error("seedDemoStones needs the demo shop and its lead (accounts step first).");
  const actor: Actor = { userId, shopId: context.shopId, role: "lead" };
  for (const machine of MACHINES) await createMachine({ actor, input: { ...machine, notes: NOTE } });
  for (const input of STONES) {
    const { stoneId } = await createStone({ actor, input, reason: REASON });
    for (const [material, rate] of Object.entries(RATES[input.code] ?? {})) {
      await createRateRow({ actor, input: rateInput(stoneId, material as BoreMaterial, rate), reason: REASON });
    }
  }
  await db.update(machines).set({ isDemo: true }).where(eq(machines.shopId, context.shopId));
  await db.update(stones).set({ isDemo: true }).where(eq(stones.shopId, context.shopId));
}
