import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getViewer } from "@/server/auth/current";
import { Notice } from "@/components/ui/notice";
import { buttonClass } from "@/components/ui/button";
import { NavForm } from "@/components/nav/nav-form";
import { ForgetFloorPages } from "@/components/floor/offline-pages";
import { signOutAction } from "@/app/nav-actions";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function SignInPage({ searchParams }: Props) {
  const params = await searchParams;
  const viewer = await getViewer();
  if (viewer?.actor) redirect("/");
  const next = typeof params.next === "string" ? params.next.slice(0, 200) : "";
  return (
    <div className="flex flex-col gap-6">
      <ForgetFloorPages />
      <h1 className="text-title">Sign in</h1>
      {params.reset === "done" ? <Notice tone="pass">Your password was changed. Sign in with the new one.</Notice> : null}
      {viewer && !viewer.actor ? (
        <Notice tone="caution" title="You are not a member of any shop">
          <p>You are signed in as {viewer.user.email}, but no shop lists you as a member any more. Ask a shop owner for an invitation.</p>
          <NavForm action={signOutAction} className="mt-2">
            <button type="submit" className={buttonClass("secondary")}>
              Sign out
            </button>
          </NavForm>
        </Notice>
      ) : (
        <SignInForm next={next} />
      )}
      <p className="text-ink-soft">
        <Link href="/reset" className="inline-flex min-h-[24px] min-w-[24px] items-center font-semibold text-steel underline" data-testid="forgot-password">
          Forgot your password?
        </Link>
      </p>
      <p className="text-ink-soft">
        New to Borewise?{" "}
        <Link href="/sign-up" className="font-semibold text-steel underline">
          Create a shop
        </Link>
      </p>
    </div>
  );
}
