import { describe, expect, it } from "vitest";
import { jobSchema, jobListSchema } from "./schema";
import { pistonSchema } from "@/shared/pistons/schema";
import { readingOutOfRange, readingSetSchema } from "@/shared/readings/schema";
import { shopSettingsSchema, DEFAULT_SHOP_SETTINGS } from "@/shared/shop-settings/schema";
import { customerSchema } from "@/shared/customers/schema";

const job = { engineDescription: "inline six, 3.4 L", boreMaterial: "grey_iron", cylinderCount: 6, standardBoreUm: 92_000, boreLengthUm: 138_000, torquePlate: false };
const paths = (r: { success: boolean; error?: { issues: Array<{ path: PropertyKey[] }> } }) => r.error?.issues.map((i) => i.path.join(".")) ?? [];

describe("intake schemas (physical limits)", () => {
  it("accepts a normal job and refuses out-of-range sizes with the limits in mm", () => {
    expect(jobSchema.safeParse(job).success).toBe(true);
    const bad = jobSchema.safeParse({ ...job, standardBoreUm: 19_999, cylinderCount: 0, boreMaterial: "cheese" });
    expect(paths(bad).sort()).toEqual(["boreMaterial", "cylinderCount", "standardBoreUm"]);
    expect(bad.error?.issues.find((i) => i.path[0] === "standardBoreUm")?.message).toBe("The standard bore must be between 20 mm and 400 mm.");
    expect(paths(jobSchema.safeParse({ ...job, standardBoreUm: Number.NaN }))).toEqual(["standardBoreUm"]);
    expect(paths(jobSchema.safeParse({ ...job, wallThicknessUm: 3_000, minWallUm: 3_200 }))).toEqual(["minWallUm"]);
    expect(paths(jobSchema.safeParse({ ...job, dueDate: "2026-02-30x" }))).toEqual(["dueDate"]);
    expect(jobSchema.safeParse({ ...job, dueDate: "2026-02-30" }).error?.issues[0]?.message).toBe("That date does not exist.");
    expect(jobSchema.safeParse({ ...job, dueDate: "2028-02-29" }).success).toBe(true);
  });

  it("defaults the job list to open jobs, newest number first, and caps the page size", () => {
    expect(jobListSchema.parse({})).toMatchObject({ status: "open", sort: "number", dir: "desc", page: 1, pageSize: 20 });
    expect(jobListSchema.safeParse({ pageSize: "1000" }).success).toBe(false);
    expect(jobListSchema.parse({ dueFrom: "" }).dueFrom).toBeUndefined();
  });

  it("refuses an inverted clearance band and a reading set with a repeated level", () => {
    const piston = { label: "1", diameterUm: 93_920, sizingHeightUm: 12_700, type: "forged", clearanceMinUm: 110, clearanceMaxUm: 90 };
    expect(paths(pistonSchema.safeParse(piston))).toEqual(["clearanceMaxUm"]);
    const levels = [{ name: "top", aUm: 92_000, bUm: 92_000 }, { name: "Top", aUm: 92_000, bUm: 92_000 }];
    expect(paths(readingSetSchema.safeParse({ cylinderId: "x", kind: "final", levels }))).toEqual(["levels"]);
  });

  it("flags a reading more than 3 mm from the standard bore as a slip", () => {
    expect(readingOutOfRange(92_040, 92_000)).toBeNull();
    expect(readingOutOfRange(93_000, 92_000)).toBeNull(); // +1.00 mm oversize is fine
    expect(readingOutOfRange(3_623, 92_000)).toMatch(/check the unit/);
  });

  it("keeps the default settings valid and refuses duplicate steps or levels", () => {
    const defaults = { ...DEFAULT_SHOP_SETTINGS, oversizeStepsUm: [...DEFAULT_SHOP_SETTINGS.oversizeStepsUm], readingLevels: [...DEFAULT_SHOP_SETTINGS.readingLevels] };
    expect(shopSettingsSchema.safeParse(defaults).success).toBe(true);
    expect(paths(shopSettingsSchema.safeParse({ ...defaults, oversizeStepsUm: [0, 250, 250], readingLevels: ["top", "TOP"] })).sort()).toEqual(["oversizeStepsUm", "readingLevels"]);
    expect(paths(shopSettingsSchema.safeParse({ ...defaults, readingLevels: ["top"] }))).toEqual(["readingLevels"]);
  });

  it("turns empty optional customer fields into null and checks the e-mail", () => {
    expect(customerSchema.parse({ name: " A ", email: "", phone: "" })).toEqual({ name: "A", email: null, phone: null });
    expect(paths(customerSchema.safeParse({ name: "A", email: "not-mail" }))).toEqual(["email"]);
  });
});
