import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { plexMono, plexSans } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Nodewright', template: '%s · Nodewright' },
  description: 'Orbit design memos whose numbers are computed, reviewed and frozen.',
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${plexSans.variable} ${plexMono.variable}`}>
      <body className="min-h-screen">{children}</body>
    </html>
  );
}
