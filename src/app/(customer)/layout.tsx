import type { ReactNode } from "react";
import { SiteHeader } from "@/components/site-header";

// Pages a shop's customer opens from a link, without an account: the quote answer and the paid page.
export default function CustomerLayout({ children }: { children: ReactNode }) {
  return (
    <>
      <SiteHeader />
      <main className="mx-auto w-full max-w-3xl px-4 py-8">{children}</main>
    </>
  );
}
