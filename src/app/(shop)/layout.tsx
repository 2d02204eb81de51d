import type { ReactNode } from "react";
import { redirect } from "next/navigation";
import { getViewer } from "@/server/auth/current";
import { ShopHeader } from "@/components/nav/shop-header";
import { signOutAction, switchShopAction } from "@/app/nav-actions";

// Every signed-in page: the header with nav and shop switcher. The proxy only guesses from cookie
// presence; this is the real check (and every action and route handler checks again).
export default async function ShopLayout({ children }: { children: ReactNode }) {
  const viewer = await getViewer();
  if (!viewer) redirect("/sign-in");
  if (!viewer.actor) redirect("/sign-in?reason=no-shop");
  return (
    <>
      <ShopHeader viewer={{ ...viewer, actor: viewer.actor }} actions={{ signOut: signOutAction, switchShop: switchShopAction }} />
      <main id="main" tabIndex={-1} className="mx-auto max-w-6xl px-4 py-6">{children}</main>
    </>
  );
}
