import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import "./globals.css";

// Fonts are committed in app/fonts (copied by scripts/copy-fonts.mjs, OFL-1.1).
// The "latin" subsets have no Greek, so each family gets a second face limited to
// U+0370–03FF; it is only downloaded when a page shows Δ, α, μ, θ…
// next/font requires every option below to be an inline literal.
const sans = localFont({
  src: "./fonts/inter-latin-wght-normal.woff2",
  variable: "--font-inter",
  weight: "100 900",
  display: "swap",
});

const sansGreek = localFont({
  src: "./fonts/inter-greek-wght-normal.woff2",
  variable: "--font-inter-greek",
  weight: "100 900",
  display: "swap",
  preload: false,
  adjustFontFallback: false,
  declarations: [{ prop: "unicode-range", value: "U+0370-03FF" }],
});

const mono = localFont({
  src: "./fonts/jetbrains-mono-latin-wght-normal.woff2",
  variable: "--font-jetbrains-mono",
  weight: "100 800",
  display: "swap",
});

const monoGreek = localFont({
  src: "./fonts/jetbrains-mono-greek-wght-normal.woff2",
  variable: "--font-mono-greek",
  weight: "100 800",
  display: "swap",
  preload: false,
  adjustFontFallback: false,
  declarations: [{ prop: "unicode-range", value: "U+0370-03FF" }],
});

export const metadata: Metadata = {
  title: {
    template: "%s · Gybe",
    default: "Gybe — gravity-assist tour design",
  },
  description:
    "A shared web workbench for designing interplanetary gravity-assist tours: Lambert arcs, powered flybys, B-plane aiming, window scans and tour search, with team review.",
  applicationName: "Gybe",
};

export const viewport: Viewport = {
  themeColor: [
    { media: "(prefers-color-scheme: dark)", color: "#0b0f1c" },
    { media: "(prefers-color-scheme: light)", color: "#f5f7fa" },
  ],
  colorScheme: "dark light",
};

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={[sans, sansGreek, mono, monoGreek].map((f) => f.variable).join(" ")}>
      <body className="bg-canvas font-sans text-ink antialiased">{children}</body>
    </html>
  );
}
