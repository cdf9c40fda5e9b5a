import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { connection } from 'next/server';
import { plexMono, plexSans } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Nodewright', template: '%s · Nodewright' },
  description: 'Orbit design memos whose numbers are computed, reviewed and frozen.',
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page renders per request: proxy.ts gives each response its own CSP nonce, which Next stamps on its scripts.
  await connection();
  return (
    <html lang="en" className={`${plexSans.variable} ${plexMono.variable}`}>
      <body className="min-h-screen">{children}</body>
    </html>
  );
}
