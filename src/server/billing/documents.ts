import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { shops } from "@/server/db/schema";
import { notFound } from "@/server/errors";
import type { Actor } from "@/shared/auth/policy";
import { readLogo } from "@/server/records/logo";
import { getInvoice } from "./invoices";
import { getQuote } from "./quotes";
import { invoicePdfDocument, quotePdfDocument } from "./pdf";
import { knownTimeZone } from "@/shared/time";

// A quote's or an invoice's PDF document, from the same rows its page reads.

/** The shop's name and time zone as its quotes and invoices show them. */
export async function shopOf(shopId: string): Promise<{ shopName: string; timeZone: string }> {
  const [shop] = await db.select({ name: shops.name, timeZone: shops.timeZone }).from(shops).where(eq(shops.id, shopId)).limit(1);
  return { shopName: shop?.name ?? "The shop", timeZone: knownTimeZone(shop?.timeZone) };
}

export async function quoteDocument({ actor, quoteId }: { actor: Actor; quoteId: string }) {
  const quote = await getQuote({ actor, quoteId });
  if (!quote) throw notFound("That quote");
  return quotePdfDocument({ quote, lines: quote.lines, ...(await shopOf(actor.shopId)), jobNumber: quote.job?.number ?? null, logo: await readLogo(actor.shopId) });
}

export async function invoiceDocument({ actor, invoiceId }: { actor: Actor; invoiceId: string }) {
  const invoice = await getInvoice({ actor, invoiceId });
  if (!invoice) throw notFound("That invoice");
  return invoicePdfDocument({ invoice, lines: invoice.lines, ...(await shopOf(actor.shopId)), jobNumber: invoice.jobNumber, logo: await readLogo(actor.shopId) });
}
