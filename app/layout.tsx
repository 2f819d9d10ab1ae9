import "@fontsource/roboto/400.css";
import "@fontsource/roboto/500.css";
import "@fontsource/roboto/700.css";
import "./globals.css";
import type { Metadata, Viewport } from "next";
import { headers } from "next/headers";
import type { ReactNode } from "react";
import { Providers } from "@/app/providers";

export const metadata: Metadata = {
  title: { default: "Treadcast", template: "%s · Treadcast" },
  description: "Tyre scrub, wear and cost-per-hour quotes for equipment dealers.",
  // Files in public/, drawn by scripts/icons/draw-icons.py.
  icons: {
    icon: [
      { url: "/favicon.ico", sizes: "16x16 32x32 48x48" },
      { url: "/icon.svg", type: "image/svg+xml" },
    ],
    apple: "/apple-touch-icon.png",
  },
  manifest: "/manifest.webmanifest",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1 };

// Reading the request's headers renders every page per request, so each carries the nonce of
// its own CSP (a page prerendered at build time would have inline scripts with no nonce).
export default async function RootLayout({ children }: { children: ReactNode }) {
  await headers();
  return (
    <html lang="en">
      <body className="font-sans">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
