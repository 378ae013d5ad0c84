import type { NextConfig } from "next";

const config: NextConfig = {
  // The test run builds into its own folder so it never disturbs a running `npm start`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  serverExternalPackages: ["knex", "pg", "pg-boss", "bcryptjs", "pdfkit"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default config;
