import type { Metadata } from "next";
import Link from "next/link";
import { isUsableResetToken } from "@/server/auth/password-reset";
import { Notice } from "@/components/ui/notice";
import { ResetPasswordForm } from "./reset-password-form";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const usable = await isUsableResetToken(token);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-title">Choose a new password</h1>
      {usable ? (
        <>
          <p className="text-ink-soft">After the change, every browser signed in to your account is signed out.</p>
          <ResetPasswordForm token={token} />
        </>
      ) : (
        <Notice tone="caution" title="This link cannot be used">
          <p>It has expired or was already used.</p>
          <Link href="/reset" className="font-semibold text-steel underline">
            Ask for a new link
          </Link>
        </Notice>
      )}
    </div>
  );
}
