/** @type {import('next').NextConfig} */
const nextConfig = {
  // The test run builds into its own folder so it never clobbers a running demo's build.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  reactStrictMode: true,
};

export default nextConfig;
