/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize resolves optional dialect packages at runtime; bundling it fails.
  // umzug only runs from scripts and the start-up migration, never in a page bundle.
  // The mail stack (nodemailer, the local smtp-server and mailparser) runs as plain Node modules.
  // rate-limiter-flexible's index requires every store it ships; load it from node_modules at run time.
  serverExternalPackages: ['rate-limiter-flexible', 'sequelize', 'sqlite3', 'umzug', '@react-pdf/renderer', 'vega', 'vega-lite', 'nodemailer', 'smtp-server', 'mailparser'],
  poweredByHeader: false,
  reactStrictMode: true,
};

export default nextConfig;
