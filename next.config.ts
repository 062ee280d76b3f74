import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Sequelize must stay external (it requires optional dialect modules at run time); umzug too for webpack builds.
  serverExternalPackages: ["sequelize", "sqlite3", "umzug", "nodemailer"],
  poweredByHeader: false,
};

export default nextConfig;
