/** @type {import('next').NextConfig} */
const nextConfig = {
  // The test run builds into its own folder so it never clobbers a running demo's build.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  reactStrictMode: true,
  // Loaded from node_modules at run time rather than bundled: the mail queue and the SMTP client, and
  // the SVG renderer, which reads its WebAssembly from there.
  serverExternalPackages: ["pg-boss", "nodemailer", "@resvg/resvg-wasm"],
};

export default nextConfig;
