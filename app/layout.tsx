import type { Metadata, Viewport } from "next";
import { headers } from "next/headers";
import type { ReactNode } from "react";
import { Providers } from "@/components/providers";
import { siteIcons } from "@/lib/site-icons";
import { palette } from "@/tailwind.config";
import { bodyFont, displayFont } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Castline", template: "%s · Castline" },
  description: "Plans a garden's feeding around what its worm bins actually make.",
  icons: siteIcons,
};

export const viewport: Viewport = {
  width: "device-width",
  initialScale: 1,
  themeColor: palette.leaf[700],
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Reading the request makes every page render per request, which the CSP
  // nonce needs (a prerendered page would carry no nonce and its scripts would be blocked).
  await headers();
  return (
    <html lang="en" className={`${bodyFont.variable} ${displayFont.variable}`}>
      <body>
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
