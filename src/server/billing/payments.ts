import "server-only";
import Stripe from "stripe";
import { and, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { invoices, payments, type Invoice } from "@/server/db/schema";
import { newId } from "@/server/db/ids";
import { inTransaction } from "@/server/db/retry";
import { assertCan } from "@/server/auth/guard";
import type { Actor } from "@/shared/auth/policy";
import { AppError, isDuplicateKey, notFound } from "@/server/errors";
import { appUrl } from "@/server/mail/messages";
import { paymentConfig } from "@/env";

// Card payment through the provider's SDK: a Checkout Session for an issued invoice's frozen total,
// and the signed webhook that marks it paid. Keys come from env.ts and are never logged.
let client: Stripe | null = null;

function stripe(): Stripe {
  if (client) return client;
  const { secretKey, apiBase } = paymentConfig();
  const base = apiBase ? new URL(apiBase) : null;
  client = new Stripe(secretKey, {
    maxNetworkRetries: 1,
    timeout: 10_000,
    ...(base ? { host: base.hostname, port: Number(base.port || (base.protocol === "https:" ? 443 : 80)), protocol: base.protocol === "https:" ? "https" : "http" } : {}),
  });
  return client;
}

/** The invoice's payment link: its open session if it has one, else a new session for the frozen total. */
export async function checkoutLink({ actor, invoiceId }: { actor: Actor; invoiceId: string }): Promise<{ url: string }> {
  assertCan(actor, "invoices.edit");
  const [invoice] = await db.select().from(invoices).where(and(eq(invoices.id, invoiceId), eq(invoices.shopId, actor.shopId))).limit(1);
  if (!invoice) throw notFound("That invoice");
  return { url: await checkoutUrlOf(invoice) };
}

/**
 * The one way to a payment page, for the shop's screens, the invoice mail, the machining record and its
 * customer page alike (the caller has checked who may ask): the open session, else a new one.
 */
export async function checkoutUrlOf(invoice: Invoice): Promise<string> {
  if (invoice.status !== "issued") throw new AppError("conflict", invoice.status === "paid" ? "This invoice is already paid." : "Only an issued invoice can be paid.");
  if (invoice.checkoutSessionId && invoice.checkoutUrl) {
    const existing = await stripe().checkout.sessions.retrieve(invoice.checkoutSessionId);
    if (existing.status === "open" && existing.url) return existing.url;
  }
  const session = await stripe().checkout.sessions.create(
    {
      mode: "payment",
      line_items: [{ quantity: 1, price_data: { currency: invoice.currency.toLowerCase(), unit_amount: invoice.totalMinor, product_data: { name: `Invoice ${invoice.numberText}` } } }],
      client_reference_id: invoice.id,
      metadata: { invoiceId: invoice.id, shopId: invoice.shopId },
      success_url: appUrl(`/paid?invoice=${encodeURIComponent(invoice.numberText ?? "")}`),
      cancel_url: appUrl(`/paid?invoice=${encodeURIComponent(invoice.numberText ?? "")}&cancelled=1`),
      ...(invoice.customerEmail ? { customer_email: invoice.customerEmail } : {}),
    },
    { idempotencyKey: `checkout-${invoice.id}-${invoice.checkoutSessionId ?? "first"}` },
  );
  if (!session.url) throw new AppError("unavailable", "The payment service gave no payment page. Try again.");
  await db.update(invoices).set({ checkoutSessionId: session.id, checkoutUrl: session.url }).where(eq(invoices.id, invoice.id));
  return session.url;
}

export type WebhookOutcome = "applied" | "duplicate" | "ignored";

/**
 * Verifies the signature with the SDK (throws on a bad one), then applies a completed, paid checkout
 * once: the payment row's unique event id makes a repeated delivery change nothing.
 */
export async function applyPaymentWebhook(rawBody: string, signature: string | null): Promise<WebhookOutcome> {
  let event: Stripe.Event;
  try {
    event = stripe().webhooks.constructEvent(rawBody, signature ?? "", paymentConfig().webhookSecret);
  } catch {
    throw new AppError("bad_request", "The signature of that event is not valid.");
  }
  if (event.type !== "checkout.session.completed") return "ignored";
  const session = event.data.object;
  if (session.payment_status !== "paid") return "ignored";
  const invoiceId = session.metadata?.invoiceId ?? session.client_reference_id;
  if (!invoiceId) return "ignored";
  try {
    return await inTransaction(async (tx) => {
      const [invoice] = await tx.select().from(invoices).where(eq(invoices.id, invoiceId)).for("update");
      if (!invoice || invoice.checkoutSessionId !== session.id) return "ignored";
      await tx.insert(payments).values({
        id: newId(), shopId: invoice.shopId, invoiceId, provider: "stripe", providerEventId: event.id, providerSessionId: session.id,
        providerPaymentId: typeof session.payment_intent === "string" ? session.payment_intent : (session.payment_intent?.id ?? null),
        amountMinor: session.amount_total ?? 0, currency: (session.currency ?? "").toUpperCase().slice(0, 3),
      });
      const covers = session.amount_total === invoice.totalMinor && (session.currency ?? "").toUpperCase() === invoice.currency;
      // A payment on a voided invoice is kept (the shop refunds it); only an issued invoice becomes paid.
      if (invoice.status === "issued" && covers) await tx.update(invoices).set({ status: "paid", paidAt: new Date(event.created * 1000), updatedAt: new Date() }).where(eq(invoices.id, invoiceId));
      return "applied" as const;
    });
  } catch (error) {
    if (isDuplicateKey(error)) return "duplicate";
    throw error;
  }
}
