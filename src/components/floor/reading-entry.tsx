"use client";
import type { KeyboardEvent } from "react";
import { parseLength, type LengthUnit } from "@/lib/honing";
import { measuringOrder, nextCell } from "@/lib/next-cell";

export type ReadingDraft = { values: Record<string, string>; blockC: string; gaugeC: string };
export const emptyReading = (): ReadingDraft => ({ values: {}, blockC: "", gaugeC: "" });

const cell = "num min-h-touch w-full rounded-md border border-rule-strong bg-white px-3 text-right text-lead";

/**
 * The levels × A/B grid and the two temperatures; values typed in the viewer's size unit. Enter moves
 * on in the measuring order (a keyboard-wedge gauge types a value and Enter), and after the last reading
 * hands over to `onLastEnter` (the card focuses its Next: never a send by surprise).
 */
export function ReadingEntry({ levels, unit, draft, onChange, testId, shopGaugeC = null, onLastEnter }: { levels: readonly string[]; unit: LengthUnit; draft: ReadingDraft; onChange: (d: ReadingDraft) => void; testId: string; shopGaugeC?: number | null; onLastEnter?: () => void }) {
  const set = (key: string, value: string) => onChange({ ...draft, values: { ...draft.values, [key]: value } });
  const order = measuringOrder(levels);
  const cellId = (key: string) => `${testId}-cell-${key}`;
  const enterMoves = (key: string | null) => (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key !== "Enter") return;
    event.preventDefault();
    const next = key === null ? null : nextCell(order, key);
    if (next) document.getElementById(cellId(next))?.focus();
    else onLastEnter?.();
  };
  return (
    <div className="flex flex-col gap-3" data-testid={testId}>
      <table className="w-full max-w-xl border-separate border-spacing-2">
        <thead>
          <tr className="text-left text-caption text-ink-soft"><th>Level</th><th>A (thrust), {unit}</th><th>B (pin axis), {unit}</th></tr>
        </thead>
        <tbody>
          {levels.map((name) => (
            <tr key={name}>
              <th scope="row" className="text-left text-lead">{name}</th>
              {(["A", "B"] as const).map((d) => (
                <td key={d}>
                  <input id={cellId(`${name}.${d}`)} aria-label={`${name} ${d} (${unit})`} inputMode="decimal" enterKeyHint="next" className={cell} value={draft.values[`${name}.${d}`] ?? ""}
                    onChange={(e) => set(`${name}.${d}`, e.target.value)} onKeyDown={enterMoves(`${name}.${d}`)} data-testid={`${testId}-${name}-${d}`} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <div className="grid max-w-xl grid-cols-2 gap-3">
        <label className="flex flex-col gap-1 text-caption text-ink-soft">Block temperature (°C)
          <input id={`${testId}-block-c`} inputMode="decimal" className={cell} value={draft.blockC} onChange={(e) => onChange({ ...draft, blockC: e.target.value })}
            onKeyDown={(e) => { if (e.key === "Enter") { e.preventDefault(); document.getElementById(`${testId}-gauge-c`)?.focus(); } }} data-testid={`${testId}-block-c`} />
        </label>
        <label className="flex flex-col gap-1 text-caption text-ink-soft">Gauge temperature (°C){shopGaugeC !== null ? `, blank = the shop's ${shopGaugeC} °C` : ""}
          <input inputMode="decimal" className={cell} value={draft.gaugeC} placeholder={shopGaugeC !== null ? String(shopGaugeC) : undefined} onChange={(e) => onChange({ ...draft, gaugeC: e.target.value })}
            id={`${testId}-gauge-c`} onKeyDown={enterMoves(null)} data-testid={`${testId}-gauge-c`} />
        </label>
      </div>
    </div>
  );
}

/** The draft as levels in µm and temperatures, or the first thing that needs fixing; a blank gauge takes the shop's setting. */
export function parseReading(draft: ReadingDraft, levels: readonly string[], unit: LengthUnit, shopGaugeC: number | null = null):
  | { ok: true; levels: { name: string; aUm: number; bUm: number }[]; temperatures: { blockC: number; gaugeC: number } | null }
  | { ok: false; error: string } {
  const out: { name: string; aUm: number; bUm: number }[] = [];
  for (const name of levels) {
    const values: number[] = [];
    for (const d of ["A", "B"]) {
      const parsed = parseLength(draft.values[`${name}.${d}`] ?? "", unit);
      if (!parsed.ok) return { ok: false, error: `${name} ${d}: ${parsed.error}` };
      values.push(parsed.um);
    }
    out.push({ name, aUm: values[0]!, bUm: values[1]! });
  }
  const gaugeText = draft.gaugeC.trim() !== "" ? draft.gaugeC.trim() : draft.blockC.trim() !== "" && shopGaugeC !== null ? String(shopGaugeC) : "";
  const hasTemps = draft.blockC.trim() !== "" || gaugeText !== "";
  if (!hasTemps) return { ok: true, levels: out, temperatures: null };
  const blockC = Number(draft.blockC), gaugeC = Number(gaugeText);
  if (!Number.isFinite(blockC) || !Number.isFinite(gaugeC) || draft.blockC.trim() === "" || gaugeText === "") return { ok: false, error: "Enter both temperatures, or neither." };
  return { ok: true, levels: out, temperatures: { blockC, gaugeC } };
}
