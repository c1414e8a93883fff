import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { Providers } from "@/components/providers";
import { SiteFooter } from "@/components/shell/site-footer";
import { SiteHeader } from "@/components/shell/site-header";
import { requestSessionToken } from "./_server/session-cookie";
import { displayFont, monoFont, textFont } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Backplate", template: "%s · Backplate" },
  description:
    "Design, simulate and review condenser-microphone front ends: response into real loads, sensitivity, self-noise, spread.",
  // served from public/, so browsers stop asking for a /favicon.ico that does not exist
  icons: { icon: { url: "/backplate-mark.svg", type: "image/svg+xml" } },
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#15181c" };

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Reads the signed cookie only (no database), so the header's first paint knows whether someone is signed in.
  const token = await requestSessionToken();
  const serverUser = token?.sub ? { name: token.name ?? null, email: token.email ?? null } : null;
  return (
    <html lang="en" className={`${displayFont.variable} ${textFont.variable} ${monoFont.variable}`}>
      <body className="flex min-h-screen flex-col">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-paper focus:p-2">
          Skip to content
        </a>
        <Providers>
          <SiteHeader serverUser={serverUser} />
          <main id="main" className="flex-1">
            {children}
          </main>
          <SiteFooter />
        </Providers>
      </body>
    </html>
  );
}
