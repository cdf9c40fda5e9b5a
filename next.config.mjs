/**
 * Security headers that are the same on every response (pages, API, static
 * files). The pages' Content-Security-Policy carries a per-request nonce and
 * is set by proxy.ts; the API's is fixed and set here, except for attachments
 * and PDFs, whose routes set policies of their own.
 */
const everyResponse = [
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(), payment=(), usb=()' },
];

/** JSON and files from the API are never documents that run anything, and are never framed. */
const apiContentSecurityPolicy = "default-src 'none'; frame-ancestors 'none'";

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize resolves optional dialect packages at runtime; bundling it fails.
  // umzug only runs from scripts and the start-up migration, never in a page bundle.
  // The mail stack (nodemailer, the local smtp-server and mailparser) runs as plain Node modules.
  // piscina starts its worker threads from its own files (and ours from lib/jobs through tsx), never from the bundle.
  // rate-limiter-flexible's index requires every store it ships; load it from node_modules at run time.
  serverExternalPackages: [
    'rate-limiter-flexible',
    'sequelize',
    'sqlite3',
    'umzug',
    '@react-pdf/renderer',
    'vega',
    'vega-lite',
    'nodemailer',
    'smtp-server',
    'mailparser',
    'piscina',
    'satellite.js',
    'pg',
  ],
  poweredByHeader: false,
  reactStrictMode: true,
  experimental: {
    // No page takes a request body (there are no server actions); proxy.ts copies at most this much of one.
    proxyClientMaxBodySize: 64 * 1024,
  },
  async headers() {
    return [
      { source: '/:path*', headers: everyResponse },
      // Routes with a policy of their own are left out (a second policy would apply as well):
      // attachments (sandboxed, lib/attachments/attachment-response-headers.ts) and PDFs (lib/pdf/pdf-content-security-policy.ts).
      {
        source: '/api/:path((?!attachments/)(?!.*/pdf$).*)',
        headers: [{ key: 'Content-Security-Policy', value: apiContentSecurityPolicy }],
      },
    ];
  },
};

export default nextConfig;
