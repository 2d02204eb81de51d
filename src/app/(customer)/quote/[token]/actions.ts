"use server";
import { definePublicAction } from "@/server/auth/public-action";
import { decideQuote } from "@/server/billing/quotes";
import { decisionSchema } from "@/shared/billing/schema";

/** The customer's answer through the quote's link: no account; the one-time link is the check. */
export const decideQuoteAction = definePublicAction(decisionSchema, async ({ token, decision }) => {
  const { outcome, jobNumber } = await decideQuote({ token, decision });
  return {
    ok: true as const,
    message: outcome === "accepted" ? `Thank you: the quote is accepted${jobNumber ? ` and booked in as job #${jobNumber}` : ""}. The shop will be in touch.` : "Thank you: the quote is declined. Nothing will be booked.",
  };
});
