import "server-only";
import { invoiceTotals, jobMinutes, minutesToHourMilli, type InvoiceTotals } from "@/lib/billing";
import type { BillingSettingsRow } from "@/server/db/schema";
import type { LineSource, PriceItemKind } from "@/shared/billing/constants";
import type { ManualLine } from "@/shared/billing/schema";
import type { PriceList } from "./settings";
import type { WorkDone } from "./work";

// Drafted lines: one per priced kind of work, counted from the stages, plus machine time from the
// spindle-time estimate, then the manual lines as typed. A kind with no price item is left out (the
// shop adds it to the price list or as a manual line).
export type DraftLine = { source: LineSource; description: string; quantityMilli: number; unitPriceMinor: number; taxRateBp: number };

export function estimatedMinutes(work: WorkDone, settings: BillingSettingsRow, torquePlate: boolean): number {
  const cylinders = work.cylinders.map((c) => c.stages);
  if (cylinders.length === 0) return 0;
  return jobMinutes(cylinders, { cylinderSetUpMin: settings.cylinderSetUpMin, stoneChangeMin: settings.stoneChangeMin, jobSetUpMin: torquePlate ? settings.jobSetUpMin : 0 }).totalMin;
}

export function draftLines(args: { work: WorkDone; priceList: PriceList; settings: BillingSettingsRow; torquePlate: boolean; source: LineSource; manual: ManualLine[] }): DraftLine[] {
  const { work, priceList, source } = args;
  const count = (kinds: string[]) => work.cylinders.filter((c) => c.stages.some((s) => kinds.includes(s.kind))).length;
  const quantities: [PriceItemKind, number][] = [
    ["boring", count(["bore"]) * 1000],
    ["honing", count(["coarse", "finish"]) * 1000],
    ["plateau", count(["plateau"]) * 1000],
    ["torque_plate", args.torquePlate ? 1000 : 0],
    ["machine_hour", minutesToHourMilli(estimatedMinutes(work, args.settings, args.torquePlate))],
  ];
  const drafted: DraftLine[] = [];
  for (const [kind, quantityMilli] of quantities) {
    const item = priceList.items.find((i) => i.kind === kind);
    if (!item || quantityMilli <= 0) continue;
    drafted.push({ source, description: item.name, quantityMilli, unitPriceMinor: item.unitPriceMinor, taxRateBp: item.taxRateBp });
  }
  return [...drafted, ...args.manual.map((m) => ({ source: "manual" as const, description: m.description, quantityMilli: m.quantity, unitPriceMinor: m.unitPrice, taxRateBp: m.taxRate }))];
}

/** Lines as rows (with their net) and the document's totals, computed by the one rounding rule. */
export function priced(lines: DraftLine[]): { rows: (DraftLine & { position: number; netMinor: number })[]; totals: InvoiceTotals } {
  const totals = invoiceTotals(lines);
  return { rows: lines.map((l, i) => ({ ...l, position: i + 1, netMinor: totals.lines[i]!.netMinor })), totals };
}
