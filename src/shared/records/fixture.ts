// An invented two-cylinder record source for the record's unit tests (test data, not trade values).
import type { RecordSource } from "./view";

export function sampleRecordSource(over: Partial<RecordSource> = {}): RecordSource {
  const at = new Date("2026-11-02T09:30:00.000Z");
  const cyl = (number: number, base: number) => ({
    number,
    piston: { label: `P${number}`, diameterUm: 93_920, sizingHeightUm: 15_000 },
    levels: [
      { name: "top", aUm: base + 2.4, bUm: base + 1.6 },
      { name: "middle", aUm: base + 1.0, bUm: base + 0.6 },
      { name: "bottom", aUm: base, bUm: base + 0.2 },
    ],
    verdict: { minUm: base, maxUm: base + 2.4, taperUm: 2.0, outOfRoundUm: 0.8 },
    surface: number === 1 ? { raUm: 0.42, rkUm: 0.61, mr2Pct: 84 } : null,
    stages: [{ role: "coarse" as const, code: "C-110 (test)", grit: "#120" }, { role: "plateau" as const, code: "P-400 (test)", grit: "#400" }],
    inspectedBy: "Test Inspector",
    inspectedAt: new Date(at.getTime() + number * 60_000),
  });
  return {
    shop: { name: "Test Shop", address: "1 Test Lane", contact: "test@example.test", hasLogo: false, remarks: "Follow the makers' run-in instructions.", oversizeStepsUm: [0, 250, 500], timeZone: "UTC" },
    job: { id: "job-1", number: 12, customer: "Test Customer", engineDescription: "test twin", boreMaterial: "grey_iron", standardBoreUm: 94_000, torquePlate: true, notes: "Test note." },
    cylinders: [cyl(2, 94_008.2), cyl(1, 94_010.0)],
    madeAt: at,
    ...over,
  };
}
