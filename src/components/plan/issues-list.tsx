import type { PlanIssue } from "@/lib/honing";
import type { PlanView } from "@/server/plans/preview-view";
import { issueText, ISSUE_STEP } from "./issue-text";
import type { DisplayUnits } from "@/shared/units";
import { userText } from "@/shared/words/user-text";

type CylinderIssues = { cylinder: number; plan: PlanView | null; needs?: Array<{ field: string; message: string }> };

const TONE = { error: "border-stop bg-stop-light", warning: "border-caution bg-caution-light", info: "border-steel bg-steel-light" } as const;
const LABEL = { error: "Error", warning: "Warning", info: "Note" } as const;

function IssueItem({ issue, cylinders, units, stoneName }: { issue: PlanIssue; cylinders: number[]; units: DisplayUnits; stoneName: (id: string) => string }) {
  const text = issueText(issue, units, stoneName);
  const which = cylinders.length === 1 ? `Cylinder ${cylinders[0]}` : `Cylinders ${cylinders.join(", ")}`;
  return (
    <li className={`rounded-md border-l-4 px-3 py-2 ${TONE[issue.severity]}`} data-testid={`issue-${issue.code}`} role={issue.severity === "error" ? "alert" : undefined}>
      <p className="font-semibold">
        <span className={issue.severity === "error" ? "text-stop" : issue.severity === "warning" ? "text-caution" : "text-steel-dark"}>{LABEL[issue.severity]}</span>
        {" · "}{which}: {text.title}
      </p>
      <p className="num text-body">{text.detail}</p>
      {text.wayOut ? <p className="text-body"><span className="font-semibold">Way out: </span>{text.wayOut}</p> : null}
    </li>
  );
}

/** Issues that read the same on several cylinders are shown once, naming the cylinders. */
function grouped(items: Array<{ issue: PlanIssue; cylinder: number }>, units: DisplayUnits, stoneName: (id: string) => string) {
  const groups = new Map<string, { issue: PlanIssue; cylinders: number[] }>();
  for (const { issue, cylinder } of items) {
    const t = issueText(issue, units, stoneName);
    const key = `${issue.code}|${t.title}|${t.detail}`;
    const group = groups.get(key) ?? { issue, cylinders: [] };
    if (!group.cylinders.includes(cylinder)) group.cylinders.push(cylinder);
    groups.set(key, group);
  }
  return [...groups.values()];
}

/** Every issue of the given cylinders (optionally only those of one step), errors first, with numbers. */
export function IssuesList({ cylinders, units, stoneName, step, emptyText }: {
  cylinders: CylinderIssues[]; units: DisplayUnits; stoneName: (id: string) => string; step?: "pistons" | "readings" | "stones" | "stroke"; emptyText?: string;
}) {
  const rank = { error: 0, warning: 1, info: 2 } as const;
  const items = cylinders.flatMap((c) =>
    (c.plan?.issues ?? []).filter((i) => !step || ISSUE_STEP[i.code] === step).map((issue) => ({ issue, cylinder: c.cylinder })),
  ).sort((a, b) => rank[a.issue.severity] - rank[b.issue.severity] || a.cylinder - b.cylinder);
  const needs = cylinders.flatMap((c) => (c.needs ?? []).map((n) => ({ ...n, cylinder: c.cylinder })));
  if (items.length === 0 && needs.length === 0) return emptyText ? <p className="text-ink-soft">{emptyText}</p> : null;
  return (
    <ul className="flex flex-col gap-2" aria-label="Warnings and errors">
      {needs.map((n) => (
        <li key={`${n.cylinder}-${n.field}`} role="alert" className="rounded-md border-l-4 border-stop bg-stop-light px-3 py-2">
          <p className="font-semibold"><span className="text-stop">Needs a figure</span> · {userText(n.message)}</p>
        </li>
      ))}
      {grouped(items, units, stoneName).map(({ issue, cylinders: which }, i) => (
        <IssueItem key={`${which.join("-")}-${issue.code}-${i}`} issue={issue} cylinders={which} units={units} stoneName={stoneName} />
      ))}
    </ul>
  );
}
