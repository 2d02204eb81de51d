"use server";
import { z } from "zod";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { defineAction } from "@/server/http/action";
import { bookQuoteByHand, createQuote, sendQuote } from "@/server/billing/quotes";
import { quoteCreateSchema, quoteFormSchema } from "@/shared/billing/schema";
import { id } from "@/shared/fields";

/** The quick wizard's quote: called with the object it validated with quoteCreateSchema. */
export const createQuoteAction = defineAction(quoteCreateSchema, "quotes.edit", async (actor, input) => {
  const created = await createQuote({ actor, input });
  revalidatePath("/quotes");
  return { ok: true as const, message: "Quote drafted.", data: created };
});

/** A job's quote from the plain form (one optional manual line); opens the drafted quote. */
export const createJobQuoteAction = defineAction(quoteFormSchema, "quotes.edit", async (actor, input) => {
  const created = await createQuote({ actor, input });
  revalidatePath("/quotes");
  redirect(`/quotes/${created.id}`);
});

export const sendQuoteAction = defineAction(z.object({ quoteId: id }), "quotes.edit", async (actor, { quoteId }) => {
  await sendQuote({ actor, quoteId });
  revalidatePath(`/quotes/${quoteId}`);
  return { ok: true as const, message: "Sent to the customer with a link to accept or decline." };
});

/** Books in an accepted quote whose booking failed; a second call answers with the same job. */
export const bookQuoteAction = defineAction(z.object({ quoteId: id }), "quotes.edit", async (actor, { quoteId }) => {
  const { jobNumber, alreadyBooked } = await bookQuoteByHand({ actor, quoteId });
  revalidatePath(`/quotes/${quoteId}`);
  return { ok: true as const, message: `${alreadyBooked ? "Already booked in" : "Booked in"}${jobNumber ? ` as job #${jobNumber}` : ""}.` };
});
