import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Packages with Node-only internals stay outside the server bundle.
  serverExternalPackages: ["exceljs", "mysql2", "nodemailer", "mailparser", "bcryptjs", "psychrolib"],
  poweredByHeader: false,
  typedRoutes: false,
  turbopack: { root: __dirname },
};

export default nextConfig;
