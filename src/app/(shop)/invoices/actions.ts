"use server";
import { z } from "zod";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { defineAction } from "@/server/http/action";
import { createInvoiceDraft, issueInvoice, voidInvoice } from "@/server/billing/invoices";
import { amendInvoiceDraft } from "@/server/billing/invoice-edit";
import { checkoutLink } from "@/server/billing/payments";
import { sendInvoice } from "@/server/billing/invoice-mail";
import { invoiceAmendSchema, invoiceDraftFormSchema, voidSchema } from "@/shared/billing/schema";
import { id } from "@/shared/fields";

const invoiceId = z.object({ invoiceId: id });

export const draftInvoiceAction = defineAction(invoiceDraftFormSchema, "invoices.edit", async (actor, input) => {
  const { id: created } = await createInvoiceDraft({ actor, input: { ...input, lines: [] } });
  revalidatePath("/invoices");
  redirect(`/invoices/${created}`);
});

export const amendInvoiceAction = defineAction(invoiceAmendSchema, "invoices.edit", async (actor, input) => {
  await amendInvoiceDraft({ actor, input });
  revalidatePath(`/invoices/${input.invoiceId}`);
  return { ok: true as const, message: "Saved." };
});

export const issueInvoiceAction = defineAction(invoiceId, "invoices.issue", async (actor, { invoiceId }) => {
  const { numberText } = await issueInvoice({ actor, invoiceId });
  revalidatePath(`/invoices/${invoiceId}`);
  return { ok: true as const, message: `Issued as ${numberText}.` };
});

export const voidInvoiceAction = defineAction(invoiceId.extend(voidSchema.shape), "invoices.issue", async (actor, { invoiceId, reason }) => {
  await voidInvoice({ actor, invoiceId, input: { reason } });
  revalidatePath(`/invoices/${invoiceId}`);
  return { ok: true as const, message: "Voided; the reason is kept with it." };
});

/** Opens the provider's payment page for the invoice (a new Checkout Session, or its open one). */
export const payByCardAction = defineAction(invoiceId, "invoices.edit", async (actor, { invoiceId }) => {
  const { url } = await checkoutLink({ actor, invoiceId });
  redirect(url);
});

/** E-mails the issued invoice to its customer: the PDF attached and the card payment link. */
export const sendInvoiceAction = defineAction(invoiceId, "invoices.edit", async (actor, { invoiceId }) => {
  const { sentTo } = await sendInvoice({ actor, invoiceId });
  revalidatePath(`/invoices/${invoiceId}`);
  return { ok: true as const, message: `Sent to ${sentTo} with the PDF and the payment link.` };
});
