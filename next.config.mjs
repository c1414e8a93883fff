/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // The browser tests build into their own folder so a running `npm start` keeps its build.
  distDir: process.env.BACKPLATE_DIST_DIR || ".next",
  // pg is a Node library with optional native bindings: keep it out of the server bundle.
  serverExternalPackages: ["pg"],
};

export default nextConfig;
