import type { Metadata } from 'next';
import { headers } from 'next/headers';
import type { ReactNode } from 'react';
import { mono, sans } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Tenderline', template: '%s · Tenderline' },
  description: 'Sourced produce properties and contact-pressure checks for packhouse engineers.',
  manifest: '/manifest.webmanifest',
  icons: { icon: '/icon.svg' },
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page renders per request, so Next can put this response's CSP nonce on its scripts.
  await headers();
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-screen font-sans">{children}</body>
    </html>
  );
}
