import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { plexMono, plexSans } from "@/app/fonts";
import { Providers } from "@/app/providers";
import { SiteFooter } from "@/components/layout/site-footer";
import { SiteHeader } from "@/components/layout/site-header";
import { getEnv } from "@/lib/server/env";
import { getCurrentUser } from "@/lib/server/session";
import { themeInitScript } from "@/lib/theme";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Mooring", template: "%s · Mooring" },
  description: "A shared workbench for configurations of parallel D-branes and their open-string spectra.",
};

export const viewport: Viewport = {
  themeColor: [
    { media: "(prefers-color-scheme: light)", color: "#f9fafb" },
    { media: "(prefers-color-scheme: dark)", color: "#14171d" },
  ],
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  const user = await getCurrentUser();
  const showMailbox = Boolean(getEnv().MAILBOX_URL);

  return (
    <html lang="en" className={`${plexSans.variable} ${plexMono.variable}`} suppressHydrationWarning>
      <head>
        <script dangerouslySetInnerHTML={{ __html: themeInitScript }} />
      </head>
      <body className="flex min-h-screen flex-col bg-background font-sans text-foreground">
        <Providers>
          <SiteHeader user={user} showMailbox={showMailbox} />
          <main id="main" className="flex flex-1 flex-col">
            {children}
          </main>
          <SiteFooter />
        </Providers>
      </body>
    </html>
  );
}
