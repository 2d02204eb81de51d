// Shared by the settings form and the server.
import { z } from "zod";
import { DEFAULT_AS_RECEIVED_CLEANUP_UM, DEFAULT_BORE_ABOVE_STOCK_UM, DEFAULT_BORING_MARGIN_UM, DEFAULT_BORING_RZ_UM } from "@/lib/honing";

/** Defaults until the shop sets its own (DESIGN.md §5.2, trade-facts §3.3 and §7). */
export const DEFAULT_SHOP_SETTINGS = {
  // Finished-bore tolerances: taper 10 µm, out-of-round 5 µm [C, DESIGN.md §5.2].
  taperToleranceUm: 10,
  outOfRoundToleranceUm: 5,
  // The bore-to allowance is the stone sequence's clean-up stocks plus this margin (DESIGN §5.1).
  boringMarginUm: DEFAULT_BORING_MARGIN_UM,
  // Finish boring Rz, as-received clean-up and the "bore first" threshold: see src/lib/honing/allowance.ts.
  boringRzUm: DEFAULT_BORING_RZ_UM,
  asReceivedCleanupUm: DEFAULT_AS_RECEIVED_CLEANUP_UM,
  boreAboveStockUm: DEFAULT_BORE_ABOVE_STOCK_UM,
  // Metric service oversizes 0.25 / 0.50 / 0.75 / 1.00 mm [V S17, trade-facts §7]; 0 = standard.
  oversizeStepsUm: [0, 250, 500, 750, 1000],
  readingLevels: ["top", "middle", "bottom"],
} as const;

export type ShopSettings = {
  taperToleranceUm: number;
  outOfRoundToleranceUm: number;
  boringMarginUm: number;
  boringRzUm: number;
  asReceivedCleanupUm: number;
  boreAboveStockUm: number;
  oversizeStepsUm: number[];
  readingLevels: string[];
};

const toleranceUm = (what: string) =>
  z.number({ error: `Enter the ${what}.` }).min(0.5, `The ${what} must be at least 0.5 µm.`).max(200, `The ${what} must be at most 200 µm.`);

const levelName = z
  .string()
  .trim()
  .min(1, "A level needs a name.")
  .max(40, "Level names are at most 40 characters.")
  .regex(/^[\p{L}\p{N} .\-]+$/u, "Use letters, digits, spaces, dots or dashes in level names.");

export const shopSettingsSchema = z
  .object({
    taperToleranceUm: toleranceUm("taper tolerance"),
    outOfRoundToleranceUm: toleranceUm("out-of-round tolerance"),
    boringMarginUm: z.number({ error: "Enter the boring margin." }).min(0, "The boring margin cannot be negative.").max(200, "The boring margin must be at most 200 µm."),
    boringRzUm: z.number({ error: "Enter the boring finish Rz." }).min(0.5, "The boring finish Rz must be at least 0.5 µm.").max(50, "The boring finish Rz must be at most 50 µm."),
    asReceivedCleanupUm: z.number({ error: "Enter the as-received clean-up." }).min(0, "The as-received clean-up cannot be negative.").max(200, "The as-received clean-up must be at most 200 µm."),
    boreAboveStockUm: z.number({ error: "Enter the bore-first threshold." }).min(10, "Bore first above at least 10 µm of stock.").max(500, "Honing takes at most 500 µm [trade-facts §3.2]: set at most 500 µm."),
    oversizeStepsUm: z
      .array(z.number().min(0, "Steps cannot be negative.").max(3000, "Steps above 3 mm are sleeving, not oversizing."))
      .min(1, "List at least one step.")
      .max(12, "At most 12 steps."),
    readingLevels: z.array(levelName).min(2, "Measure at least two levels (top and bottom).").max(6, "At most 6 levels."),
  })
  .superRefine((value, ctx) => {
    if (new Set(value.readingLevels.map((l) => l.toLowerCase())).size !== value.readingLevels.length) {
      ctx.addIssue({ code: "custom", path: ["readingLevels"], message: "Each level needs its own name." });
    }
    if (new Set(value.oversizeStepsUm).size !== value.oversizeStepsUm.length) {
      ctx.addIssue({ code: "custom", path: ["oversizeStepsUm"], message: "A step is listed twice." });
    }
  });

export type ShopSettingsInput = z.infer<typeof shopSettingsSchema>;
