import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { inter, sourceCodePro } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Borewise", template: "%s · Borewise" },
  description: "Plan, guide and record the honing of engine cylinder bores.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#f6f4ee" };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${inter.variable} ${sourceCodePro.variable}`} data-font-sans={inter.style.fontFamily}>
      <body className="min-h-screen">{children}</body>
    </html>
  );
}
