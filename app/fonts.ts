import localFont from 'next/font/local';

// Shipped in fonts/ (from @fontsource packages) so nothing is fetched at build or run time.
export const sans = localFont({
  src: '../fonts/inter-latin-wght.woff2',
  variable: '--font-sans',
  weight: '100 900',
  display: 'swap',
});

export const mono = localFont({
  src: [
    { path: '../fonts/jetbrains-mono-latin-400.woff2', weight: '400' },
    { path: '../fonts/jetbrains-mono-latin-700.woff2', weight: '700' },
  ],
  variable: '--font-mono',
  display: 'swap',
});
