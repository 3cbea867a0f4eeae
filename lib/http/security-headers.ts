/**
 * The browser-side protections every answer carries (next.config.ts sets the fixed ones, proxy.ts
 * the pages' content security policy with a fresh nonce per request).
 */

/** On every answer: no MIME sniffing, no framing, no address sent to other sites. */
export const SECURITY_HEADERS: { key: string; value: string }[] = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  // Invitation links carry their token in the path: never send the address to another site.
  { key: "Referrer-Policy", value: "same-origin" },
  // frame-ancestors 'none' in the policies below does the same for browsers that read CSP.
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
];

/**
 * API answers are JSON, files and PDFs opened in a tab: nothing of them may be framed. (A stricter
 * default-src 'none' would stop some browsers' built-in PDF viewers from showing the lot reports.)
 */
export const API_CONTENT_SECURITY_POLICY = "frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

/**
 * The pages' policy. Scripts run only with this request's nonce (Next puts it on its own scripts
 * and on the chunks they load, hence 'strict-dynamic'); development adds 'unsafe-eval' for React's
 * error overlays and a WebSocket for reloads. Styles allow inline: AG Grid writes its theme as
 * <style> elements and React renders style="" attributes (grids, charts, column widths); styles
 * cannot run code, so this is the usual trade.
 */
export function pageContentSecurityPolicy({
  nonce,
  development,
}: {
  nonce: string;
  development: boolean;
}): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    `connect-src 'self'${development ? " ws: wss:" : ""}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}
