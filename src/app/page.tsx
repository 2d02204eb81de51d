import Link from "next/link";
import { SiteHeader } from "@/components/site-header";
import { buttonClass } from "@/components/ui/button";
import { Dashboard } from "./_dashboard/dashboard";
import { ShopHeader } from "@/components/nav/shop-header";
import { signOutAction, switchShopAction } from "@/app/nav-actions";
import { getViewer } from "@/server/auth/current";

// "/" is the shop's dashboard when signed in (DESIGN.md §4), the landing page otherwise.
export default async function HomePage() {
  const viewer = await getViewer();
  if (viewer?.actor) {
    return (
      <>
        <ShopHeader viewer={{ ...viewer, actor: viewer.actor }} actions={{ signOut: signOutAction, switchShop: switchShopAction }} />
        <main id="main" tabIndex={-1} className="mx-auto max-w-6xl px-4 py-6">
          <Dashboard actor={viewer.actor} />
        </main>
      </>
    );
  }
  return <Landing />;
}

function Landing() {
  return (
    <>
      <SiteHeader>
        <Link href="/sign-in" className="inline-flex min-h-touch items-center rounded-md px-4 font-semibold text-steel hover:bg-steel-light" data-testid="home-sign-in">
          Sign in
        </Link>
        <Link href="/sign-up" className={buttonClass("primary")} data-testid="home-sign-up">
          Create a shop
        </Link>
      </SiteHeader>
      <main id="main" tabIndex={-1} className="mx-auto max-w-6xl px-4 py-10">
        <h1 className="text-display" data-testid="home-title">
          Every bore to size, every time.
        </h1>
        <p className="mt-4 max-w-2xl text-lead text-ink-soft">
          Borewise plans the honing of each cylinder from the measured piston and its clearance, guides the
          operator at the machine card by card, checks the finished bore at top, middle and bottom in both
          directions, and records it for your customer.
        </p>
        <dl className="mt-8 grid max-w-3xl grid-cols-1 gap-4 sm:grid-cols-3">
          {[
            ["Plan", "Grit sequence, strokes per stage, stroke set-up and crosshatch."],
            ["Guide", "Step cards at the machine, with checkpoints and cautions."],
            ["Record", "Final sizes and clearances for the customer, and learning for the next job."],
          ].map(([term, detail]) => (
            <div key={term} className="rounded-lg border border-rule bg-paper-raised p-4">
              <dt className="font-semibold">{term}</dt>
              <dd className="mt-1 text-ink-soft">{detail}</dd>
            </div>
          ))}
        </dl>
        <p className="mt-8 text-caption text-ink-faint">
          Example finished bore: <span className="num">86.045 mm</span> for an <span className="num">85.990 mm</span> piston
          with <span className="num">0.055 mm</span> clearance (invented figures).
        </p>
      </main>
    </>
  );
}
