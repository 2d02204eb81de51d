// @ts-check
// Configurator mode of @serwist/next: `serwist build` (run right after `next build`, see
// scripts/build.sh) bundles src/worker/floor-sw.ts with esbuild and injects the list of the build's
// static files into it. Works with Turbopack, because it reads the finished build, not the bundler.
import { serwist } from "@serwist/next/config";

export default serwist({
  swSrc: "src/worker/floor-sw.ts",
  swDest: "public/sw.js",
  // Floor pages need a session, so nothing is prerendered worth keeping; robots.txt is not needed offline.
  precachePrerendered: false,
  globIgnores: ["public/**/*"],
  maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
});
