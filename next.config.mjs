/** @type {import('next').NextConfig} */
const nextConfig = {
  // sequelize require()s its dialect at run time, so it must stay external.
  serverExternalPackages: ["sequelize", "pg", "pg-hstore", "bullmq", "ioredis", "pg-copy-streams", "nodemailer", "busboy", "@aws-sdk/client-s3", "@aws-sdk/lib-storage"],
  poweredByHeader: false,
  typedRoutes: false,
  experimental: { serverActions: { bodySizeLimit: "10mb" } },
};
export default nextConfig;
