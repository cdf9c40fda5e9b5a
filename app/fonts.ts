import localFont from 'next/font/local';

/** IBM Plex (SIL Open Font License 1.1, public/fonts/OFL-IBMPlex.txt), served from our own files. */
export const plexSans = localFont({
  src: [
    { path: '../public/fonts/IBMPlexSans_400Regular.ttf', weight: '400', style: 'normal' },
    { path: '../public/fonts/IBMPlexSans_400Regular_Italic.ttf', weight: '400', style: 'italic' },
    { path: '../public/fonts/IBMPlexSans_500Medium.ttf', weight: '500', style: 'normal' },
    { path: '../public/fonts/IBMPlexSans_600SemiBold.ttf', weight: '600', style: 'normal' },
    { path: '../public/fonts/IBMPlexSans_700Bold.ttf', weight: '700', style: 'normal' },
  ],
  variable: '--font-plex-sans',
  display: 'swap',
});

export const plexMono = localFont({
  src: [
    { path: '../public/fonts/IBMPlexMono_400Regular.ttf', weight: '400', style: 'normal' },
    { path: '../public/fonts/IBMPlexMono_500Medium.ttf', weight: '500', style: 'normal' },
  ],
  variable: '--font-plex-mono',
  preload: false,
  display: 'swap',
});
