"use client";
import { LengthInput } from "@/components/length-input";
import type { FieldErrors } from "../use-plan-preview";
import type { DisplayUnits } from "@/shared/units";
import type { Options } from "./types";

/** The maker's clearance band, the target inside it and the performance allowance. */
export function ClearanceFields({ clearance, onChange, errors, units }: {
  clearance: Options["clearance"]; onChange: (c: Options["clearance"]) => void; errors: FieldErrors; units: DisplayUnits;
}) {
  const set = (patch: Partial<Options["clearance"]>) => onChange({ ...clearance, ...patch });
  return (
    <fieldset className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4">
      <legend className="mb-2 font-semibold">Piston-to-bore clearance (maker&apos;s band)</legend>
      <LengthInput label="Smallest clearance" unit={units.small} valueUm={clearance.minUm} onChange={(v) => set({ minUm: v ?? Number.NaN })} errors={errors["clearance.minUm"]} testId="clearance-min" />
      <LengthInput label="Largest clearance" unit={units.small} valueUm={clearance.maxUm} onChange={(v) => set({ maxUm: v ?? Number.NaN })} errors={errors["clearance.maxUm"]} testId="clearance-max" />
      <LengthInput label="Target clearance" unit={units.small} optional valueUm={clearance.targetUm} onChange={(v) => set({ targetUm: v })} errors={errors["clearance.targetUm"]} hint="Empty: the middle of the band." testId="clearance-target" />
      <LengthInput label="Performance allowance" unit={units.small} optional valueUm={clearance.performanceAllowanceUm} onChange={(v) => set({ performanceAllowanceUm: v ?? 0 })} errors={errors["clearance.performanceAllowanceUm"]} hint="Moves the target only; the maker's band still decides pass or fail." testId="clearance-allowance" />
      <LengthInput label="Widen the band's upper limit" unit={units.small} optional valueUm={clearance.bandWideningUm ?? 0} onChange={(v) => set({ bandWideningUm: v ?? 0 })} errors={errors["clearance.bandWideningUm"]} hint="Only if you accept a looser bore than the maker's band; shown on the review." testId="clearance-widening" />
    </fieldset>
  );
}
