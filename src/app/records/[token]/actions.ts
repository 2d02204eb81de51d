"use server";
import { z } from "zod";
import { redirect } from "next/navigation";
import { definePublicAction } from "@/server/auth/public-action";
import { checkoutForRecordToken } from "@/server/billing/customer-payment";

/** "Pay invoice" on the customer's record page: no account; the live record link is the check. */
export const payRecordInvoiceAction = definePublicAction(z.object({ token: z.string().max(100) }), async ({ token }) => {
  const url = await checkoutForRecordToken(token);
  if (!url) return { ok: false, message: "Nothing is owed on this record any more, or its link has ended. Reload the page." };
  redirect(url);
});
