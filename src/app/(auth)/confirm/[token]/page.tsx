import type { Metadata } from "next";
import { ConfirmEmailForm } from "./confirm-form";

export const metadata: Metadata = { title: "Confirm your e-mail address" };

export default async function ConfirmEmailPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-title">Confirm your e-mail address</h1>
      <p className="text-ink-soft">Once it is confirmed, your shop can send invitations to your team.</p>
      <ConfirmEmailForm token={token} />
    </div>
  );
}
