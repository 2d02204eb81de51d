import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { inTransaction } from "@/server/db/retry";
import { invoices } from "@/server/db/schema";
import { assertCan } from "@/server/auth/guard";
import { AppError, notFound } from "@/server/errors";
import { enqueueMail } from "@/server/mail/outbox";
import { mailWithPdf } from "@/server/mail/pdf-mail";
import { invoiceMessage } from "@/server/mail/messages";
import { amountText } from "@/shared/billing/format";
import type { Actor } from "@/shared/auth/policy";
import { invoiceDocument, shopOf } from "./documents";
import { billingPdf } from "./pdf";
import { checkoutLink } from "./payments";
import { dateText } from "@/shared/time";

/**
 * E-mails an issued invoice to its customer: the PDF attached and the card payment link (the invoice's
 * open Checkout Session, or a new one for the frozen total). Sending again sends another copy.
 */
export async function sendInvoice({ actor, invoiceId }: { actor: Actor; invoiceId: string }): Promise<{ sentTo: string }> {
  assertCan(actor, "invoices.edit");
  const [invoice] = await db.select().from(invoices).where(and(eq(invoices.id, invoiceId), eq(invoices.shopId, actor.shopId))).limit(1);
  if (!invoice) throw notFound("That invoice");
  if (invoice.status !== "issued") throw new AppError("conflict", invoice.status === "paid" ? "This invoice is paid already." : "Only an issued invoice is sent to the customer.");
  if (!invoice.customerEmail) throw new AppError("bad_request", "The invoice has no customer e-mail address: add it to the job's customer first.");
  const { url } = await checkoutLink({ actor, invoiceId });
  const { doc, filename } = await invoiceDocument({ actor, invoiceId });
  const { shopName, timeZone } = await shopOf(actor.shopId);
  const mail = await invoiceMessage({
    shopName, customerName: invoice.customerName, numberText: invoice.numberText ?? "", currency: invoice.currency,
    total: amountText(invoice.totalMinor, invoice.currencyDigits), dueOn: invoice.dueAt ? dateText(invoice.dueAt, timeZone) : null, payLink: url,
  });
  await mailWithPdf(
    { shopId: actor.shopId, filename, render: () => billingPdf({ ...doc, closing: [`Pay by card from the link in the e-mail that came with this invoice.`] }) },
    async ({ attachment }) => ({ outboxId: await inTransaction((tx) => enqueueMail(tx, { ...mail, to: invoice.customerEmail, kind: "invoice", shopId: actor.shopId, attachments: [attachment] })), value: null }),
  );
  return { sentTo: invoice.customerEmail };
}
