import { notFound } from "next/navigation";
import { Card, PageTitle } from "@/components/ui/card";
import { BackLink } from "@/components/ui/back-link";
import { BillingForm } from "@/components/billing/billing-form";
import { orNotFound, pageActor } from "@/server/http/page";
import { customerOfJob } from "@/server/billing/quotes";
import { createJobQuoteAction } from "../actions";

export const metadata = { title: "New quote" };

export default async function NewQuotePage({ searchParams }: { searchParams: Promise<{ job?: string }> }) {
  const actor = await pageActor("quotes.edit", "/quotes");
  const { job: jobId } = await searchParams;
  if (!jobId || jobId.length > 36) notFound();
  const job = await orNotFound(customerOfJob({ actor, jobId }));
  return (
    <>
      <BackLink href={`/jobs/${job.jobId}`}>Back to job #{job.number}</BackLink>
      <PageTitle>Quote job #{job.number}<span className="block text-body font-normal text-ink-soft">{job.engine}: priced from its saved plan and the price list, plus a line of your own.</span></PageTitle>
      <Card>
        <BillingForm action={createJobQuoteAction} withId hidden={{ jobId: job.jobId }} testId="quote-form" submitLabel="Draft the quote" fields={[
          { name: "customerName", label: "Customer", defaultValue: job.name, maxLength: 120 },
          { name: "customerEmail", label: "Customer's e-mail", defaultValue: job.email, inputMode: "email", maxLength: 254 },
          { name: "note", label: "Note to the customer", maxLength: 2000 },
          { name: "lineDescription", label: "Extra line (optional)", maxLength: 200, hint: "e.g. a gasket set" },
          { name: "lineQuantity", label: "Quantity", inputMode: "decimal", defaultValue: "1" },
          { name: "lineUnitPrice", label: "Unit price", inputMode: "decimal" },
          { name: "lineTaxRate", label: "Tax rate", unit: "%", inputMode: "decimal", defaultValue: "0" },
        ]} />
      </Card>
    </>
  );
}
