import localFont from "next/font/local";

// Shipped with the app (fonts/README.md): no font is fetched from outside at build or run time.
export const inter = localFont({
  src: [
    { path: "../../fonts/inter/inter-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../../fonts/inter/inter-latin-600-normal.woff2", weight: "600", style: "normal" },
    { path: "../../fonts/inter/inter-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-sans",
  display: "swap",
});

export const sourceCodePro = localFont({
  src: [
    { path: "../../fonts/source-code-pro/source-code-pro-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../../fonts/source-code-pro/source-code-pro-latin-600-normal.woff2", weight: "600", style: "normal" },
  ],
  variable: "--font-mono",
  display: "swap",
});
