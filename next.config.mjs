/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  // A separate build folder per concurrent test run (scripts/test.sh sets it).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  poweredByHeader: false,
  // Worker threads and native-ish server packages must stay outside the server bundle.
  serverExternalPackages: ["piscina", "pg-boss", "pdfkit", "pg", "nodemailer", "bcryptjs"],
  // Types are checked once, by `npm test`'s typecheck step (tsc over the whole repo), not again here.
  typescript: { ignoreBuildErrors: true },
};

export default nextConfig;
