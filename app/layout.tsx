import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import "./globals.css";

// Shipped with the app (copied from @fontsource-variable/inter): the build
// makes no network request.
const sans = localFont({
  src: "../fonts/inter-latin-wght-normal.woff2",
  variable: "--font-sans",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Bellows", template: "%s · Bellows" },
  description: "Gas-lift surveillance by exception",
  icons: { icon: "/icon.svg" },
};

export const viewport: Viewport = { width: "device-width", initialScale: 1 };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={sans.variable}>
      <body className="min-h-screen font-sans">{children}</body>
    </html>
  );
}
