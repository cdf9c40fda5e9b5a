/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize resolves optional dialect packages at runtime; bundling it fails.
  // umzug only runs from scripts and the start-up migration, never in a page bundle.
  serverExternalPackages: ['sequelize', 'sqlite3', 'umzug', '@react-pdf/renderer', 'vega', 'vega-lite'],
  poweredByHeader: false,
  reactStrictMode: true,
};

export default nextConfig;
