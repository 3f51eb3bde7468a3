import type { Metadata } from "next";
import type { ReactNode } from "react";
import { plexSans, plexMono } from "./fonts";
import { Providers } from "@/components/providers";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Caryatid", template: "%s · Caryatid" },
  description: "Least-cost slender concrete columns that pass ACI 318-19 with moment magnification.",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${plexSans.variable} ${plexMono.variable}`}>
      <body className="min-h-screen">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
