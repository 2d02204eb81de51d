import nextCoreWebVitals from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";
import { layersPlugin } from "./eslint/layers.mjs";

const config = [
  ...nextCoreWebVitals,
  ...nextTypescript,
  {
    ignores: [".next/**", ".next-*/**", "node_modules/**", ".data/**", "drizzle/**", "test-results/**", "playwright-report/**", "next-env.d.ts", "tests/fixtures/layers/**", "public/sw.js"],
  },
  {
    plugins: { borewise: layersPlugin },
    rules: {
      "borewise/layers": "error",
      "@typescript-eslint/consistent-type-imports": "error",
      "@typescript-eslint/no-explicit-any": "error",
    },
  },
];

export default config;
