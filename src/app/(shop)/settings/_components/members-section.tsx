"use client";
import { startTransition, useActionState, useState } from "react";
import { Card } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { ActionForm } from "@/components/auth/action-form";
import { Confirm } from "@/components/ui/confirm";
import { ROLES, type Role } from "@/shared/auth/roles";
import { IdButtonForm } from "./id-button-form";
import { changeRoleAction, inviteAction, removeMemberAction, revokeInvitationAction } from "../actions";
import { dateTimeText } from "@/shared/time";

type Member = { membershipId: string; userId: string; name: string; email: string; role: Role; joinedAt: string };
type Invitation = { id: string; email: string; role: Role; expiresAt: string; createdAt: string };

const ROLE_OPTIONS: Array<{ value: Role; label: string }> = [
  { value: "apprentice", label: "Apprentice: follows step cards, logs readings" },
  { value: "machinist", label: "Machinist: jobs, readings, plans" },
  { value: "lead", label: "Lead: also stones, machines, releases plans" },
  { value: "owner", label: "Owner: also members and shop settings" },
];

export function MembersSection({ canManage, selfUserId, members, invitations, timeZone }: { canManage: boolean; selfUserId: string; members: Member[]; invitations: Invitation[]; timeZone: string }) {
  return (
    <>
      <Card title="Members">
        <ul className="divide-y divide-rule" data-testid="member-list">
          {members.map((m) => (
            <MemberRow key={m.membershipId} member={m} canManage={canManage} isSelf={m.userId === selfUserId} />
          ))}
        </ul>
      </Card>
      {canManage ? (
        <Card title="Invite a member">
          <div className="grid gap-6 lg:grid-cols-2">
            <ActionForm
              action={inviteAction}
              testId="invite-form"
              submitLabel="Send invitation"
              fields={[
                { name: "email", label: "E-mail", type: "email", autoComplete: "off", maxLength: 254 },
                { name: "role", label: "Role", type: "select", defaultValue: "machinist", options: ROLE_OPTIONS },
              ]}
            />
            <PendingInvitations invitations={invitations} timeZone={timeZone} />
          </div>
        </Card>
      ) : null}
    </>
  );
}

function MemberRow({ member, canManage, isSelf }: { member: Member; canManage: boolean; isSelf: boolean }) {
  const [roleState, roleAction, rolePending] = useActionState(changeRoleAction, null);
  const [removeState, removeAction, removePending] = useActionState(removeMemberAction, null);
  // Removing someone shuts them out at once, so it asks first and says what stays behind.
  const [asking, setAsking] = useState(false);
  function remove() {
    setAsking(false);
    const form = new FormData();
    form.set("membershipId", member.membershipId);
    startTransition(() => removeAction(form));
  }
  return (
    <li className="flex flex-col gap-2 py-3" data-testid="member-row" data-email={member.email}>
      <div className="flex flex-wrap items-center gap-3">
        <div className="min-w-0 flex-1">
          <p className="font-semibold">
            {member.name} {isSelf ? <span className="text-caption text-ink-soft">(you)</span> : null}
          </p>
          <p className="truncate text-caption text-ink-soft">{member.email}</p>
        </div>
        {canManage ? (
          <>
            <form action={roleAction} className="flex items-center gap-2">
              <input type="hidden" name="membershipId" value={member.membershipId} />
              <label className="sr-only" htmlFor={`role-${member.membershipId}`}>
                Role of {member.name}
              </label>
              <select id={`role-${member.membershipId}`} name="role" defaultValue={member.role} className="min-h-touch rounded-md border border-rule-strong bg-white px-2 capitalize">
                {ROLES.map((r) => (
                  <option key={r} value={r}>
                    {r}
                  </option>
                ))}
              </select>
              <button type="submit" className={buttonClass("secondary")} disabled={rolePending}>
                Change role
              </button>
            </form>
            <button type="button" className={buttonClass("ghost", "text-stop")} disabled={removePending} onClick={() => setAsking(true)} data-testid="member-remove">
              Remove
            </button>
          </>
        ) : (
          <span className="capitalize text-ink-soft">{member.role}</span>
        )}
      </div>
      {asking ? (
        <Confirm question={`Remove ${member.name} from this shop?`} consequence={removalConsequence(member.name, isSelf)}
          yes="Yes, remove" danger onYes={remove} onNo={() => setAsking(false)} testId="confirm-remove-member" />
      ) : null}
      {roleState?.message || removeState?.message ? <FormMessage state={removeState ?? roleState} /> : null}
    </li>
  );
}

function removalConsequence(name: string, isSelf: boolean): string {
  const who = isSelf ? "You" : name;
  return `${who} can no longer open this shop's jobs, plans or floor, from the next page on. What ${isSelf ? "you" : "they"} logged stays on the jobs; cylinders assigned to ${isSelf ? "you" : "them"} stay so until someone assigns them to another member. To let ${isSelf ? "yourself" : "them"} back in, an owner sends a new invitation.`;
}

function PendingInvitations({ invitations, timeZone }: { invitations: Invitation[]; timeZone: string }) {
  const [state, action, pending] = useActionState(revokeInvitationAction, null);
  return (
    <div className="flex flex-col gap-2" data-testid="pending-invitations">
      <h3 className="font-semibold">Waiting to be accepted</h3>
      {invitations.length === 0 ? <p className="text-ink-soft">No open invitations.</p> : null}
      <ul className="divide-y divide-rule">
        {invitations.map((i) => (
          <li key={i.id} className="flex flex-wrap items-center gap-2 py-2">
            <div className="min-w-0 flex-1">
              <p className="truncate">{i.email}</p>
              <p className="text-caption text-ink-soft" suppressHydrationWarning>
                <span className="capitalize">{i.role}</span> · link valid until <span className="num">{dateTimeText(i.expiresAt, timeZone)}</span>
              </p>
            </div>
            <IdButtonForm action={action} name="invitationId" value={i.id} pending={pending} className={buttonClass("ghost")}>
              Withdraw
            </IdButtonForm>
          </li>
        ))}
      </ul>
      <FormMessage state={state} />
    </div>
  );
}
