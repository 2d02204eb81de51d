import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { invoiceLines } from "@/server/db/schema";
import type { Actor } from "@/shared/auth/policy";
import { AppError } from "@/server/errors";
import { invoiceAmendSchema, manualLineSchema } from "@/shared/billing/schema";
import { updateInvoiceDraft } from "./invoices";

// The invoice page's plain form: the header fields plus one line added or removed, turned into a
// whole-draft update (the version check in updateInvoiceDraft refuses a stale form).
export async function amendInvoiceDraft({ actor, input }: { actor: Actor; input: unknown }) {
  const { invoiceId, version, customerName, customerEmail, note, lineDescription, lineQuantity, lineUnitPrice, lineTaxRate, removePosition } = invoiceAmendSchema.parse(input);
  const current = await db.select().from(invoiceLines).where(and(eq(invoiceLines.invoiceId, invoiceId), eq(invoiceLines.shopId, actor.shopId))).orderBy(asc(invoiceLines.position));
  const kept = current.filter((l) => l.position !== removePosition)
    .map((l) => ({ source: l.source, description: l.description, quantity: l.quantityMilli, unitPrice: l.unitPriceMinor, taxRate: l.taxRateBp }));
  if (lineDescription) {
    const parsed = manualLineSchema.safeParse({ description: lineDescription, quantity: lineQuantity || "1", unitPrice: lineUnitPrice, taxRate: lineTaxRate || "0" });
    if (!parsed.success) {
      const fieldErrors = Object.fromEntries(parsed.error.issues.map((i) => [`line${String(i.path[0] ?? "").replace(/^./, (c) => c.toUpperCase())}`, [i.message]]));
      throw new AppError("bad_request", "Check the new line.", { fieldErrors });
    }
    kept.push({ source: "manual", ...parsed.data });
  }
  return updateInvoiceDraft({ actor, invoiceId, input: { version, customerName, customerEmail, note, lines: kept } });
}
