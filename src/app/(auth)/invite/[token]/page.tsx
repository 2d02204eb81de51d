import type { Metadata } from "next";
import Link from "next/link";
import { findUsableInvitation } from "@/server/auth/invitations";
import { getCurrentSession } from "@/server/auth/session";
import { Notice } from "@/components/ui/notice";
import { AcceptInvitationForm } from "./accept-form";

export const metadata: Metadata = { title: "Invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await findUsableInvitation(token);
  if (!invitation) {
    return (
      <Notice tone="caution" title="This invitation cannot be used">
        <p>It has expired, was already used, or was withdrawn. Ask the shop owner for a new one.</p>
        <Link href="/sign-in" className="font-semibold text-steel underline">
          Go to sign in
        </Link>
      </Notice>
    );
  }
  const current = await getCurrentSession();
  const signedInAsInvitee = current?.user.email === invitation.email;
  const mode = signedInAsInvitee ? "signed-in" : invitation.accountExists ? "existing" : "new";
  return (
    <div className="flex flex-col gap-6" data-testid="invitation">
      <div>
        <h1 className="text-title">Join {invitation.shopName}</h1>
        <p className="mt-1 text-ink-soft">
          You are invited as <strong className="capitalize">{invitation.role}</strong>, with the address <strong>{invitation.email}</strong>.
        </p>
      </div>
      {current && !signedInAsInvitee ? (
        <Notice tone="caution">You are signed in as {current.user.email}. Accepting below signs you in as {invitation.email} instead.</Notice>
      ) : null}
      <AcceptInvitationForm token={token} mode={mode} />
    </div>
  );
}
