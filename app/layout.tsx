import type { Metadata } from "next";
import localFont from "next/font/local";
import { connection } from "next/server";
import type { ReactNode } from "react";
import { Providers } from "./providers";
import "./globals.css";

// Shipped with the app (from @fontsource-variable); nothing is fetched at build or run time.
const inter = localFont({ src: "./fonts/inter-latin-wght.woff2", variable: "--font-inter", display: "swap" });
const serif = localFont({
  src: [
    { path: "./fonts/source-serif-4-latin-wght.woff2", style: "normal" },
    { path: "./fonts/source-serif-4-latin-wght-italic.woff2", style: "italic" },
  ],
  variable: "--font-serif",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Stopwright", template: "%s · Stopwright" },
  description: "Specifications, estimates and tender documents for pipe-organ builders.",
  icons: { icon: "/favicon.svg" },
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page is rendered per request, so each gets its own script nonce (see proxy.ts).
  await connection();
  return (
    <html lang="en-GB" className={`${inter.variable} ${serif.variable}`}>
      <body className="min-h-screen bg-paper text-ink antialiased">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
