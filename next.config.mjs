/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize resolves optional dialect packages at runtime; bundling it fails.
  // umzug only runs from scripts and the start-up migration, never in a page bundle.
  // The mail stack (nodemailer, the local smtp-server and mailparser) runs as plain Node modules.
  // piscina starts its worker threads from its own files (and ours from lib/jobs through tsx), never from the bundle.
  serverExternalPackages: ['sequelize', 'sqlite3', 'umzug', '@react-pdf/renderer', 'vega', 'vega-lite', 'nodemailer', 'smtp-server', 'mailparser', 'piscina'],
  poweredByHeader: false,
  reactStrictMode: true,
};

export default nextConfig;
