/** @type {import('next').NextConfig} */
const nextConfig = {
  // Knex loads optional drivers dynamically; bundling it breaks the build.
  serverExternalPackages: ['knex', 'better-sqlite3', 'pg', 'smtp-server', 'mailparser', 'sharp'],
  // Enables forbidden() and app/forbidden.tsx for the 403 page.
  experimental: { authInterrupts: true },
  poweredByHeader: false,
};

export default nextConfig;
