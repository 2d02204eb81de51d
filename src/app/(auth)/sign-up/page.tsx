import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getViewer } from "@/server/auth/current";
import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Create a shop" };

export default async function SignUpPage() {
  if ((await getViewer())?.actor) redirect("/");
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-title">Create a shop</h1>
        <p className="mt-1 text-ink-soft">You become the shop&apos;s owner and can invite the rest of the team afterwards.</p>
      </div>
      <SignUpForm />
      <p className="text-ink-soft">
        Already have an account?{" "}
        <Link href="/sign-in" className="font-semibold text-steel underline">
          Sign in
        </Link>
      </p>
    </div>
  );
}
