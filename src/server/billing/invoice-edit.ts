import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { invoiceLines } from "@/server/db/schema";
import type { Actor } from "@/shared/auth/policy";
import { AppError } from "@/server/errors";
import { amountInput, quantityText } from "@/shared/billing/format";
import { invoiceAmendSchema, lineFieldName, manualLineSchema } from "@/shared/billing/schema";
import { updateInvoiceDraft } from "./invoices";

// The invoice page's plain form: the header fields, every line edited in place, lines removed and one
// added, turned into a whole-draft update (the version check in updateInvoiceDraft refuses a stale
// form, and an issued invoice is refused there: it is frozen). A bad field refuses the whole form.

const FIELDS = ["description", "quantity", "unitPrice", "taxRate"] as const;
const capital = (name: string) => name.replace(/^./, (c) => c.toUpperCase());

function parseLine(raw: Record<(typeof FIELDS)[number], string>, errorName: (field: string) => string, errors: Record<string, string[]>) {
  const parsed = manualLineSchema.safeParse({ ...raw, quantity: raw.quantity || "1", taxRate: raw.taxRate || "0" });
  if (parsed.success) return parsed.data;
  for (const issue of parsed.error.issues) errors[errorName(String(issue.path[0] ?? "description"))] = [issue.message];
  return null;
}

export async function amendInvoiceDraft({ actor, input }: { actor: Actor; input: unknown }) {
  const form = invoiceAmendSchema.parse(input);
  const { invoiceId, version, customerName, customerEmail, note, removePosition } = form;
  const current = await db.select().from(invoiceLines).where(and(eq(invoiceLines.invoiceId, invoiceId), eq(invoiceLines.shopId, actor.shopId))).orderBy(asc(invoiceLines.position));
  const errors: Record<string, string[]> = {};
  const kept = current.filter((l) => !removePosition.includes(l.position)).flatMap((l) => {
    const stored = { source: l.source, description: l.description, quantity: l.quantityMilli, unitPrice: l.unitPriceMinor, taxRate: l.taxRateBp };
    const typed = Object.fromEntries(FIELDS.map((f) => [f, form[lineFieldName(l.position, f)]]));
    if (FIELDS.every((f) => typed[f] === undefined)) return [stored];
    const asStored = { description: l.description, quantity: quantityText(l.quantityMilli), unitPrice: amountInput(l.unitPriceMinor), taxRate: String(l.taxRateBp / 100) };
    const raw = Object.fromEntries(FIELDS.map((f) => [f, typed[f] === undefined ? asStored[f] : String(typed[f])])) as Record<(typeof FIELDS)[number], string>;
    const parsed = parseLine(raw, (f) => lineFieldName(l.position, f as (typeof FIELDS)[number]), errors);
    return parsed ? [{ ...parsed, source: l.source }] : [];
  });
  if (form.lineDescription) {
    const added = parseLine({ description: form.lineDescription, quantity: form.lineQuantity, unitPrice: form.lineUnitPrice, taxRate: form.lineTaxRate }, (f) => `line${capital(f)}`, errors);
    if (added) kept.push({ source: "manual", ...added });
  }
  if (Object.keys(errors).length > 0) throw new AppError("bad_request", "Check the marked lines; nothing was saved.", { fieldErrors: errors });
  return updateInvoiceDraft({ actor, invoiceId, input: { version, customerName, customerEmail, note, lines: kept } });
}
