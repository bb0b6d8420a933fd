// Connection settings for sequelize-cli (migrations and seeders). The app uses models/index.ts.
const mariadb = require("mariadb");

const common = {
  use_env_variable: "DATABASE_URL",
  dialect: "mariadb",
  dialectModule: mariadb,
  logging: false,
  migrationStorageTableName: "sequelize_meta",
  seederStorage: "sequelize",
  seederStorageTableName: "sequelize_seeds",
  dialectOptions: { timezone: "Z" },
};

module.exports = { development: common, test: common, production: common };
