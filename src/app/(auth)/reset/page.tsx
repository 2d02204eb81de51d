import type { Metadata } from "next";
import Link from "next/link";
import { ResetRequestForm } from "./reset-request-form";

export const metadata: Metadata = { title: "Reset password" };

export default function ResetRequestPage() {
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-title">Reset your password</h1>
        <p className="mt-1 text-ink-soft">Enter the e-mail address of your account. We send a link to choose a new password.</p>
      </div>
      <ResetRequestForm />
      <p>
        <Link href="/sign-in" className="inline-flex min-h-[24px] min-w-[24px] items-center font-semibold text-steel underline">
          Back to sign in
        </Link>
      </p>
    </div>
  );
}
