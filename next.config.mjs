/** @type {import('next').NextConfig} */
const nextConfig = {
  // Knex loads optional drivers dynamically; bundling it breaks the build.
  serverExternalPackages: [
    'knex',
    'better-sqlite3',
    'pg',
    'smtp-server',
    'mailparser',
    'sharp',
    'rate-limiter-flexible',
    '@react-pdf/renderer',
    'piscina',
    'esbuild',
  ],
  // Enables forbidden() and app/forbidden.tsx for the 403 page.
  experimental: { authInterrupts: true },
  poweredByHeader: false,
  // Headers of every answer (pages, API, static files); the CSP nonce and HSTS come from proxy.ts.
  async headers() {
    return [
      {
        source: '/:path*',
        headers: [
          { key: 'X-Frame-Options', value: 'DENY' },
          { key: 'X-Content-Type-Options', value: 'nosniff' },
          { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
          {
            key: 'Permissions-Policy',
            value: 'camera=(), microphone=(), geolocation=(), payment=(), usb=()',
          },
          { key: 'Cross-Origin-Opener-Policy', value: 'same-origin' },
        ],
      },
    ];
  },
};

export default nextConfig;
