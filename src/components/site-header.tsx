import Link from "next/link";
import type { ReactNode } from "react";
import { BrandMark } from "./brand-mark";

export function SiteHeader({ children }: { children?: ReactNode }) {
  return (
    <header className="no-print border-b border-rule bg-paper-raised">
      <div className="mx-auto flex max-w-6xl items-center gap-4 px-4 py-3">
        <Link href="/" className="flex min-h-touch items-center gap-2 text-lead font-semibold tracking-tight">
          <BrandMark />
          <span>Borewise</span>
        </Link>
        <nav className="ml-auto flex items-center gap-2" aria-label="Main">
          {children}
        </nav>
      </div>
    </header>
  );
}
