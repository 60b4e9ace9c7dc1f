import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";

import { fontVariables } from "./fonts";

import "./globals.css";

// The mark as an inline icon, so the browser never asks for a favicon file.
const icon =
  "data:image/svg+xml," +
  encodeURIComponent(
    '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32"><rect width="32" height="32" rx="6" fill="#175a53"/><path d="M6 12.5 26 18" stroke="#e2a57c" stroke-width="3.2" stroke-linecap="round"/><path d="M8 24v-2.5M16 24v-2.5M24 24v-2.5" stroke="#fff" stroke-width="1.8" stroke-linecap="round"/></svg>',
  );

export const metadata: Metadata = {
  title: { default: "Gradeline · Sewer scopes before you buy", template: "%s · Gradeline" },
  description:
    "Gradeline books a camera inspection of a listing's building sewer with a verified local inspector and turns it into a rated summary the buyer can negotiate with: severity, footages, repair options and cost ranges.",
  applicationName: "Gradeline",
  icons: { icon },
};

export const viewport: Viewport = {
  width: "device-width",
  initialScale: 1,
  themeColor: "#faf8f3",
  colorScheme: "light",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={fontVariables}>
      <body className="min-h-dvh">
        {children}
      </body>
    </html>
  );
}
