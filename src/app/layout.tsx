import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { connection } from "next/server";
import { inter, sourceCodePro } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Borewise", template: "%s · Borewise" },
  description: "Plan, guide and record the honing of engine cylinder bores.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#f6f4ee" };

// Every page renders per request: its scripts need that response's CSP nonce (src/proxy.ts).
export default async function RootLayout({ children }: { children: ReactNode }) {
  await connection();
  return (
    <html lang="en" className={`${inter.variable} ${sourceCodePro.variable}`} data-font-sans={inter.style.fontFamily}>
      <body className="min-h-screen">
        {/* WCAG 2.4.1: keyboard users jump past the header's links straight to the page. */}
        <a href="#main" className="sr-only focus:not-sr-only focus:fixed focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-4 focus:py-3 focus:font-semibold focus:text-steel focus:shadow">
          Skip to the page
        </a>
        {children}
      </body>
    </html>
  );
}
