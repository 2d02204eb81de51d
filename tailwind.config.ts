import type { Config } from "tailwindcss";

// Borewise's own look: a calm paper base, graphite ink, one strong accent ("blued steel") for
// actions, and clear colours for out-of-tolerance (stop) and near-limit (caution) values.
const config: Config = {
  content: ["./src/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f6f4ee", raised: "#fffdf8", sunk: "#ebe7dc" },
        ink: { DEFAULT: "#1f2328", soft: "#4a5058", faint: "#6b7078" },
        rule: { DEFAULT: "#d3cdbf", strong: "#a9a192" },
        steel: { DEFAULT: "#1d4f8c", dark: "#143a68", light: "#dbe6f3" },
        stop: { DEFAULT: "#b42318", light: "#fbe4e1" },
        caution: { DEFAULT: "#8a5a00", light: "#fcefd2" },
        pass: { DEFAULT: "#1f6b3a", light: "#dcefe2" },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      fontSize: {
        caption: ["0.8125rem", { lineHeight: "1.15rem" }],
        body: ["0.9375rem", { lineHeight: "1.4rem" }],
        lead: ["1.125rem", { lineHeight: "1.6rem" }],
        title: ["1.5rem", { lineHeight: "2rem", fontWeight: "600" }],
        display: ["2.25rem", { lineHeight: "2.6rem", fontWeight: "700" }],
        gauge: ["2.75rem", { lineHeight: "3rem", fontWeight: "600" }],
      },
      minHeight: { touch: "44px" },
      minWidth: { touch: "44px" },
    },
  },
};

export default config;
