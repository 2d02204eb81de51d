import "server-only";
import { render } from "@react-email/render";
import { Text } from "@react-email/components";
import { eq } from "drizzle-orm";
import type { Tx } from "@/server/db";
import { users, type Plan } from "@/server/db/schema";
import { enqueueMail } from "@/server/mail/outbox";
import { appUrl } from "@/server/mail/messages";
import { ActionLink, MailLayout } from "@/server/mail/templates/layout";

// Floor notices to the machinist who released the plan (issue 12 §8): queued in the caller's
// transaction through the outbox, so a notice goes out once with the entry that caused it.

export type FloorNotice = { kind: "floor.stage_stopped" | "floor.cylinder_failed" | "floor.job_passed"; subject: string; lines: string[] };

function NoticeMail({ lines, link }: { lines: string[]; link: string }) {
  return (
    <MailLayout preview={lines[0] ?? "Borewise floor notice"}>
      {lines.map((line, i) => <Text key={i}>{line}</Text>)}
      <ActionLink href={link}>Open the cylinder</ActionLink>
    </MailLayout>
  );
}

/** Queues the notice to the plan's releaser (or its author when nobody released it); returns the outbox id. */
export async function queueFloorNotice(tx: Tx, plan: Pick<Plan, "id" | "shopId" | "releasedBy" | "createdBy">, cylinder: number, notice: FloorNotice): Promise<string | null> {
  const to = plan.releasedBy ?? plan.createdBy;
  const [user] = await tx.select({ email: users.email }).from(users).where(eq(users.id, to)).limit(1);
  if (!user) return null;
  const element = <NoticeMail lines={notice.lines} link={appUrl(`/floor/${plan.id}/${cylinder}`)} />;
  const [html, text] = await Promise.all([render(element), render(element, { plainText: true })]);
  return enqueueMail(tx, { to: user.email, kind: notice.kind, shopId: plan.shopId, subject: notice.subject, html, text });
}
