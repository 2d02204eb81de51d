// Plain words for the plan summary: stage strokes spelled out and a cylinder status that agrees with
// the warnings counted below it (issue 17 §3).
type Stage = { kind: string; strokes?: { nominal: number } };
type Cylinder = { needs: readonly unknown[]; plan: { errors: readonly unknown[]; warnings: readonly { severity: string }[]; stages: readonly Stage[] } | null };

export type CylinderStatus = { tone: "stop" | "caution" | "pass"; text: string };

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "2 to resolve", "1 warning" or "OK": never OK beside a warning of the same cylinder. */
export function cylinderStatus(c: Cylinder): CylinderStatus {
  const errors = c.needs.length + (c.plan?.errors.length ?? 0);
  if (errors) return { tone: "stop", text: `${errors} to resolve` };
  const warnings = c.plan?.warnings.filter((w) => w.severity === "warning").length ?? 0;
  if (warnings) return { tone: "caution", text: plural(warnings, "warning", "warnings") };
  return { tone: "pass", text: "OK" };
}

/** "bore · coarse 131 · finish 50 · plateau 19 double strokes": the strokes per stage in words. */
export function stageStrokes(stages: readonly Stage[]): string {
  const parts = stages.map((s) => (s.kind === "bore" || !s.strokes ? "bore" : `${s.kind} ${s.strokes.nominal}`));
  return parts.length && stages.some((s) => s.kind !== "bore") ? `${parts.join(" · ")} double strokes` : parts.join(" · ");
}
