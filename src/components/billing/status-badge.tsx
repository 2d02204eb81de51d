// The status of a quote or an invoice, in words and a tone (never colour alone).
const TONES: Record<string, string> = {
  draft: "bg-paper-sunk text-ink", sent: "bg-steel-light text-steel-dark", issued: "bg-steel-light text-steel-dark",
  accepted: "bg-pass-light text-pass", paid: "bg-pass-light text-pass", declined: "bg-paper-sunk text-ink-soft", void: "bg-paper-sunk text-ink-soft",
};

export function BillingStatus({ status, testId }: { status: string; testId?: string }) {
  return <span className={`inline-block rounded-md px-2 py-1 text-caption font-semibold capitalize ${TONES[status] ?? ""}`} data-testid={testId}>{status}</span>;
}
