import { JOB_STATUS_LABELS, type JobStatus } from "@/shared/jobs/constants";

const TONE: Record<JobStatus, string> = {
  received: "bg-paper-sunk text-ink",
  measured: "bg-steel-light text-steel-dark",
  planned: "bg-steel-light text-steel-dark",
  in_work: "bg-caution-light text-caution",
  inspected: "bg-pass-light text-pass",
  delivered: "bg-paper-sunk text-ink-soft",
};

export function StatusBadge({ status }: { status: JobStatus }) {
  return <span className={`inline-block rounded-full px-2 py-0.5 text-caption font-semibold ${TONE[status]}`} data-testid="job-status">{JOB_STATUS_LABELS[status]}</span>;
}
