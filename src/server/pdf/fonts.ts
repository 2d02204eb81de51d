import "server-only";
import path from "node:path";
import { Font } from "@react-pdf/renderer";

// The faces every Borewise PDF uses, embedded from the files shipped in fonts/ (fonts/README.md):
// Inter for words, Source Code Pro for figures. WOFF, which react-pdf's font reader takes; the Latin
// subset holds µ (U+00B5), ° (U+00B0), Ø (U+00D8), ± and ×, which the built-in PDF fonts would drop.
export const PDF_FONTS = { text: "Inter", figures: "SourceCodePro" } as const;

/** The screen palette's ink, soft ink, rule and steel (tailwind.config.ts), for every PDF. */
export const PDF_COLOURS = { ink: "#1f2328", soft: "#4a5058", rule: "#d3cdbf", steel: "#1d4f8c" } as const;

const dir = path.join(process.cwd(), "fonts");
let registered = false;

/** Registers the shipped faces once per process. */
export function registerPdfFonts(): void {
  if (registered) return;
  Font.register({
    family: PDF_FONTS.text,
    fonts: [
      { src: path.join(dir, "inter/inter-latin-400-normal.woff"), fontWeight: 400 },
      { src: path.join(dir, "inter/inter-latin-600-normal.woff"), fontWeight: 600 },
      { src: path.join(dir, "inter/inter-latin-700-normal.woff"), fontWeight: 700 },
    ],
  });
  Font.register({
    family: PDF_FONTS.figures,
    fonts: [
      { src: path.join(dir, "source-code-pro/source-code-pro-latin-400-normal.woff"), fontWeight: 400 },
      { src: path.join(dir, "source-code-pro/source-code-pro-latin-600-normal.woff"), fontWeight: 600 },
    ],
  });
  // Words are never split with hyphens: a figure or a stone code must stay whole.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
