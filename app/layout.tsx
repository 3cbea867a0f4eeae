import type { Metadata } from "next";
import localFont from "next/font/local";
import { connection } from "next/server";
import { Providers } from "@/components/layout/providers";
import "./globals.css";

// The font ships with the app (an npm package's files); nothing is fetched at build time.
const inter = localFont({
  src: [
    {
      path: "../node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2",
      style: "normal",
      weight: "100 900",
    },
  ],
  variable: "--font-inter",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Platload", template: "%s · Platload" },
  description: "Heating and cooling loads for every plan model, facing and lot.",
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page renders per request, so Next can put this request's CSP nonce (proxy.ts) on its scripts.
  await connection();
  return (
    <html lang="en" className={inter.variable}>
      <body className="min-h-screen font-sans text-sm">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
