import type { NextConfig } from "next";
import { PHASE_DEVELOPMENT_SERVER } from "next/constants";
import { API_CONTENT_SECURITY_POLICY, SECURITY_HEADERS } from "./lib/http/security-headers";

const PAGE_EXTENSIONS = ["tsx", "ts", "jsx", "js"];

/**
 * The development mailbox's page and route end in .dev.tsx / .dev.ts (lib/mail/mailbox.ts): they
 * are routes only in `next dev` and in a build made by the demo or test command
 * (PLATLOAD_DEMO_BUILD=1). A plain `npm run build` does not contain them at all.
 */
export function pageExtensionsFor(phase: string, demoBuild: string | undefined): string[] {
  const withMailbox = phase === PHASE_DEVELOPMENT_SERVER || demoBuild === "1";
  return withMailbox ? [...PAGE_EXTENSIONS, "dev.tsx", "dev.ts"] : PAGE_EXTENSIONS;
}

export default function nextConfig(phase: string): NextConfig {
  return {
    // Packages with Node-only internals stay outside the server bundle.
    serverExternalPackages: [
      "exceljs",
      "mysql2",
      "nodemailer",
      "mailparser",
      "bcryptjs",
      "psychrolib",
      "pdfkit",
      "rate-limiter-flexible",
    ],
    poweredByHeader: false,
    typedRoutes: false,
    pageExtensions: pageExtensionsFor(phase, process.env.PLATLOAD_DEMO_BUILD),
    // The test command type-checks the whole project with `tsc --noEmit` before it builds.
    typescript: { ignoreBuildErrors: true },
    turbopack: { root: __dirname },
    async headers() {
      return [
        { source: "/:path*", headers: SECURITY_HEADERS },
        {
          source: "/api/:path*",
          headers: [
            { key: "Content-Security-Policy", value: API_CONTENT_SECURITY_POLICY },
            { key: "Cache-Control", value: "no-store" },
          ],
        },
      ];
    },
  };
}
