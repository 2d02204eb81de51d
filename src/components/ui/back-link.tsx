import Link from "next/link";
import type { ReactNode } from "react";

/**
 * The way up from a detail page to where it belongs (issue 17 §6): one look on every page, found by
 * the fit e2e through its test id. `touch` gives it the floor's 44 px target.
 */
export function BackLink({ href, children, touch = false }: { href: string; children: ReactNode; touch?: boolean }) {
  const size = touch ? "min-h-touch min-w-touch" : "min-h-[24px] min-w-[24px]";
  return (
    <Link href={href} data-testid="back-link" className={`no-print inline-flex items-center gap-1 self-start text-steel underline ${size}`}>
      <span aria-hidden="true">←</span>
      {children}
    </Link>
  );
}
