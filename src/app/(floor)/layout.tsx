import type { ReactNode } from "react";
import { redirect } from "next/navigation";
import { getViewer } from "@/server/auth/current";
import { ShopHeader } from "@/components/nav/shop-header";
import { FloorOffline } from "@/components/floor/offline-pages";
import { FloorPerson } from "@/components/floor/floor-person";
import { SecureNotice } from "@/components/floor/secure-notice";
import { signOutAction, switchShopAction } from "@/app/nav-actions";

// The floor: the same header as the office, a narrower page for a tablet beside the machine.
export default async function FloorLayout({ children }: { children: ReactNode }) {
  const viewer = await getViewer();
  if (!viewer) redirect("/sign-in");
  if (!viewer.actor) redirect("/sign-in?reason=no-shop");
  return (
    <>
      <div className="no-print"><ShopHeader viewer={{ ...viewer, actor: viewer.actor }} actions={{ signOut: signOutAction, switchShop: switchShopAction }} /></div>
      <FloorOffline />
      <main id="main" tabIndex={-1} className="mx-auto max-w-4xl px-4 py-4">
        <SecureNotice />
        <FloorPerson userId={viewer.user.id} shopId={viewer.actor.shopId}>{children}</FloorPerson>
      </main>
    </>
  );
}
