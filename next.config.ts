import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  serverExternalPackages: ["@electric-sql/pglite", "@electric-sql/pglite-socket", "s3rver", "smtp-server", "mailparser"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
