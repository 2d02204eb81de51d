import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getViewer } from "@/server/auth/current";
import { can } from "@/shared/auth/policy";
import { listSessions } from "@/server/auth/session";
import { listMembers } from "@/server/auth/members";
import { listPendingInvitations } from "@/server/auth/invitations";
import Link from "next/link";
import { Card, PageTitle } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { UnitPreferenceForm } from "./_components/unit-preference-form";
import { ChangePasswordForm } from "./_components/change-password-form";
import { SessionList } from "./_components/session-list";
import { MembersSection } from "./_components/members-section";
import { TimeZoneForm } from "./_components/time-zone-form";
import { shopTimeZone } from "@/server/shop-settings/time-zone";
import { dateTimeText, timeZoneNames } from "@/shared/time";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const viewer = await getViewer();
  if (!viewer?.actor) redirect("/sign-in");
  const actor = viewer.actor;
  const sessions = await listSessions(viewer.user.id, viewer.session.id);
  const canSeeMembers = can(actor, "members.view");
  const zone = await shopTimeZone(actor);
  const [members, invitations] = canSeeMembers ? await Promise.all([listMembers(actor), listPendingInvitations(actor)]) : [[], []];
  return (
    <div className="flex flex-col gap-6">
      <PageTitle
        actions={
          <>
            <Link href="/settings/tolerances" className={buttonClass("secondary")}>
              Tolerances and oversize steps
            </Link>
            {can(actor, "shop.edit") ? (
              <Link href="/settings/record" className={buttonClass("secondary")}>
                Machining record
              </Link>
            ) : null}
          </>
        }
      >
        Settings
      </PageTitle>
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Card title="Units">
          <UnitPreferenceForm current={viewer.user.unitSystem} />
        </Card>
        <Card title="Password">
          <ChangePasswordForm />
        </Card>
        <Card title="Shop time zone">
          <TimeZoneForm current={zone} zones={timeZoneNames()} canEdit={can(actor, "shop.edit")} example={dateTimeText(new Date(), zone)} />
        </Card>
      </div>
      <Card title="Your sessions">
        <SessionList timeZone={zone} sessions={sessions.map((s) => ({ ...s, signedInAt: s.signedInAt.toISOString(), expiresAt: s.expiresAt.toISOString() }))} />
      </Card>
      {canSeeMembers ? (
        <MembersSection
          canManage={can(actor, "members.manage")}
          timeZone={zone}
          selfUserId={actor.userId}
          members={members.map((m) => ({ ...m, joinedAt: m.joinedAt.toISOString() }))}
          invitations={invitations.map((i) => ({ ...i, expiresAt: i.expiresAt.toISOString(), createdAt: i.createdAt.toISOString() }))}
        />
      ) : null}
    </div>
  );
}
