"use client";
import { LengthInput } from "@/components/length-input";
import type { FieldErrors } from "../use-plan-preview";
import type { Units } from "../units";
import type { Options } from "./types";

/** The maker's clearance band, the target inside it and the performance allowance. */
export function ClearanceFields({ clearance, onChange, errors, units }: {
  clearance: Options["clearance"]; onChange: (c: Options["clearance"]) => void; errors: FieldErrors; units: Units;
}) {
  const set = (patch: Partial<Options["clearance"]>) => onChange({ ...clearance, ...patch });
  return (
    <fieldset className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4">
      <legend className="mb-2 font-semibold">Piston-to-bore clearance (maker&apos;s band)</legend>
      <LengthInput label="Smallest clearance" unit={units.small} valueUm={clearance.minUm} onChange={(v) => set({ minUm: v ?? Number.NaN })} errors={errors["clearance.minUm"]} testId="clearance-min" />
      <LengthInput label="Largest clearance" unit={units.small} valueUm={clearance.maxUm} onChange={(v) => set({ maxUm: v ?? Number.NaN })} errors={errors["clearance.maxUm"]} testId="clearance-max" />
      <LengthInput label="Target clearance" unit={units.small} optional valueUm={clearance.targetUm} onChange={(v) => set({ targetUm: v })} errors={errors["clearance.targetUm"]} hint="Empty: the middle of the band." testId="clearance-target" />
      <LengthInput label="Performance allowance" unit={units.small} optional valueUm={clearance.performanceAllowanceUm} onChange={(v) => set({ performanceAllowanceUm: v ?? 0 })} errors={errors["clearance.performanceAllowanceUm"]} hint="Extra clearance you choose; shown apart." testId="clearance-allowance" />
    </fieldset>
  );
}
