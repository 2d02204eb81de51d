import Link from "next/link";
import { BrandMark } from "@/components/brand-mark";
import { buttonClass } from "@/components/ui/button";
import { can, type Permission } from "@/shared/auth/policy";
import type { Viewer } from "@/server/auth/current";
import { NavLinks, type NavItem } from "./nav-links";
import type { FormAction } from "@/shared/action-result";
import { NavForm } from "./nav-form";

// What each nav link needs; the server refuses the same things anyway (DESIGN.md §2).
const NAV: Array<NavItem & { permission: Permission | null }> = [
  { href: "/", label: "Dashboard", permission: null },
  { href: "/jobs", label: "Jobs", permission: "jobs.view" },
  { href: "/plan", label: "Quick plan", permission: "plans.create" },
  { href: "/stones", label: "Stones", permission: "stones.view" },
  { href: "/machines", label: "Machines", permission: "machines.view" },
  { href: "/runs", label: "Run log", permission: "runs.view" },
  { href: "/invoices", label: "Invoices", permission: "billing.view" },
  { href: "/settings", label: "Settings", permission: null },
];

type NavActions = { signOut: FormAction<unknown>; switchShop: FormAction<unknown> };
type ShopViewer = Viewer & { actor: NonNullable<Viewer["actor"]> };

/** The shop header; the app passes in its sign-out and shop-switch actions (components never import app code). */
export function ShopHeader({ viewer, actions }: { viewer: ShopViewer; actions: NavActions }) {
  const items = NAV.filter((i) => i.permission === null || can(viewer.actor, i.permission)).map(({ href, label }) => ({ href, label }));
  const activeShop = viewer.shops.find((s) => s.shopId === viewer.actor.shopId);
  return (
    <header className="no-print border-b border-rule bg-paper-raised" data-testid="shop-header">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2">
        <Link href="/" className="flex min-h-touch items-center gap-2 text-lead font-semibold tracking-tight">
          <BrandMark />
          <span>Borewise</span>
        </Link>
        <ShopSwitcher viewer={viewer} activeName={activeShop?.shopName ?? ""} switchShop={actions.switchShop} />
        <div className="ml-auto flex items-center gap-3">
          <span className="hidden text-ink-soft sm:inline" data-testid="signed-in-as">
            {viewer.user.name} · <span className="capitalize">{viewer.actor.role}</span>
          </span>
          <NavForm action={actions.signOut} askFor={viewer.user.id}>
            <button type="submit" className={buttonClass("secondary")} data-testid="sign-out">
              Sign out
            </button>
          </NavForm>
        </div>
      </div>
      <nav aria-label="Main" className="mx-auto max-w-6xl px-4 pb-2">
        <NavLinks items={items} />
      </nav>
    </header>
  );
}

function ShopSwitcher({ viewer, activeName, switchShop }: { viewer: ShopViewer; activeName: string; switchShop: FormAction<unknown> }) {
  if (viewer.shops.length < 2) {
    return (
      <span className="font-semibold text-ink-soft" data-testid="active-shop">
        {activeName}
      </span>
    );
  }
  return (
    <NavForm action={switchShop} className="flex items-center gap-2">
      <label htmlFor="shop-switch" className="sr-only">
        Shop
      </label>
      <select id="shop-switch" name="shopId" defaultValue={viewer.actor.shopId} className="min-h-touch rounded-md border border-rule-strong bg-white px-2" data-testid="shop-switch">
        {viewer.shops.map((s) => (
          <option key={s.shopId} value={s.shopId}>
            {s.shopName} ({s.role})
          </option>
        ))}
      </select>
      <button type="submit" className={buttonClass("ghost")}>
        Switch
      </button>
    </NavForm>
  );
}
