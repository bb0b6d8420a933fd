// The one Sequelize instance, created on first use (never at build time) and kept on globalThis
// so that dev reloads and test files reuse a single pool.
import { Sequelize } from "sequelize";
import * as mariadb from "mariadb";
import { hostChooser, parseHostList } from "@/lib/data/database-hosts";
import { initUser, User } from "./user";
import { initProduction, Production } from "./production";
import { initMembership, Membership } from "./membership";
import { initPosition, Position } from "./position";
import { initFixtureType, FixtureType } from "./fixture-type";
import { initFocusPoint, FocusPoint } from "./focus-point";
import { initFixture, Fixture } from "./fixture";
import { initCue, Cue, CueLevel } from "./cue";
import { initCuePart, CuePart } from "./cue-part";
import { initChangeEntry, ChangeEntry } from "./change-entry";
import { initAreaZone, AreaZone } from "./area-zone";
import { initLandmark, Landmark } from "./landmark";
import { initUpload, Upload } from "./upload";
import { initAccessory, Accessory } from "./accessory";
import { initImportMapping, ImportMapping } from "./import-mapping";
import { initPerformerMark, PerformerMark } from "./performer-mark";
import { initScenicPanel, ScenicPanel } from "./scenic-panel";
import { initColourTransmission, ColourTransmission } from "./colour-transmission";
import { initCircuit, Circuit } from "./circuit";
import { initDataLine, DataLine } from "./data-line";
import { initInvitation, Invitation } from "./invitation";
import { initNote, Note } from "./note";
import { initShowReport, ShowReport, ShowReportFault } from "./show-report";
import { initRevision, Revision } from "./revision";

const models = {
  User,
  Production,
  Membership,
  Position,
  FixtureType,
  FocusPoint,
  Fixture,
  Cue,
  CueLevel,
  CuePart,
  ChangeEntry,
  AreaZone,
  Landmark,
  Upload,
  Accessory,
  ImportMapping,
  PerformerMark,
  ScenicPanel,
  ColourTransmission,
  Circuit,
  DataLine,
  Invitation,
  Note,
  ShowReport,
  ShowReportFault,
  Revision,
};
export type Db = typeof models & { sequelize: Sequelize };

function associate() {
  Membership.belongsTo(User, { foreignKey: "userId", as: "user" });
  Membership.belongsTo(Production, { foreignKey: "productionId", as: "production" });
  Production.hasMany(Membership, { foreignKey: "productionId", as: "memberships" });
  Fixture.belongsTo(Position, { foreignKey: "positionId", as: "position" });
  Fixture.belongsTo(FixtureType, { foreignKey: "fixtureTypeId", as: "fixtureType" });
  Fixture.belongsTo(FocusPoint, { foreignKey: "focusPointId", as: "focusPoint" });
  Fixture.belongsTo(Production, { foreignKey: "productionId", as: "production" });
  Position.hasMany(Fixture, { foreignKey: "positionId", as: "fixtures" });
  Cue.hasMany(CueLevel, { foreignKey: "cueId", as: "levels" });
  CueLevel.belongsTo(Cue, { foreignKey: "cueId", as: "cue" });
  Cue.hasMany(CuePart, { foreignKey: "cueId", as: "parts" });
  Accessory.belongsTo(Fixture, { foreignKey: "fixtureId", as: "fixture" });
}

/** Seconds a statement waits for a row lock before failing (InnoDB rows and metadata locks alike). */
export const LOCK_WAIT_SECONDS = 5;
/** Connections in the app's pool; requests beyond it queue for up to POOL_ACQUIRE_MS. */
export const POOL_MAX = 10;
const POOL_ACQUIRE_MS = 10_000;

function createDb(): Db {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set");
  const sequelize = new Sequelize(url, {
    dialect: "mariadb",
    dialectModule: mariadb,
    logging: false,
    pool: { max: POOL_MAX, min: 0, idle: 10_000, acquire: POOL_ACQUIRE_MS },
    dialectOptions: {
      timezone: "Z",
      connectTimeout: 5_000,
      // A request waits a few seconds for a row another transaction holds, then gives up (503 with
      // Retry-After) instead of holding its connection for the server's default 50 s. One string:
      // Sequelize appends its own time-zone statement to an array given here on every connect.
      initSql: `SET SESSION innodb_lock_wait_timeout = ${LOCK_WAIT_SECONDS}, SESSION lock_wait_timeout = ${LOCK_WAIT_SECONDS}${
        // On a Galera cluster (several servers that all take writes) a read first waits until this node
        // has applied every write committed anywhere before it, so a save made through one app server
        // is seen at once through another.
        process.env.DATABASE_FAILOVER_HOSTS ? ", SESSION wsrep_sync_wait = 1" : ""
      }`,
    },
  });
  routeToAnsweringHost(sequelize, url);
  for (const init of [
    initUser,
    initProduction,
    initMembership,
    initPosition,
    initFixtureType,
    initFocusPoint,
    initFixture,
    initCue,
    initCuePart,
    initChangeEntry,
    initAreaZone,
    initLandmark,
    initUpload,
    initAccessory,
    initImportMapping,
    initPerformerMark,
    initScenicPanel,
    initColourTransmission,
    initCircuit,
    initDataLine,
    initInvitation,
    initNote,
    initShowReport,
    initRevision,
  ]) {
    init(sequelize);
  }
  associate();
  return { sequelize, ...models };
}

/** With DATABASE_FAILOVER_HOSTS set, each new connection goes to a server that answers (database-hosts.ts). */
function routeToAnsweringHost(sequelize: Sequelize, url: string) {
  const others = process.env.DATABASE_FAILOVER_HOSTS;
  if (!others) return;
  const preferred = new URL(url);
  const choose = hostChooser([
    { host: preferred.hostname, port: Number(preferred.port || 3306) },
    ...parseHostList(others),
  ]);
  sequelize.addHook("beforeConnect", async (config) => {
    const { host, port } = await choose();
    config.host = host;
    config.port = String(port); // a string, as Sequelize keeps the port it reads from the URL
  });
}

const holder = globalThis as unknown as { __throwlineDb?: Db };

export function getDb(): Db {
  holder.__throwlineDb ??= createDb();
  return holder.__throwlineDb;
}

export {
  User,
  Production,
  Membership,
  Position,
  FixtureType,
  FocusPoint,
  Fixture,
  Cue,
  CueLevel,
  CuePart,
  ChangeEntry,
  AreaZone,
  Landmark,
  Upload,
  Accessory,
  ImportMapping,
  PerformerMark,
  ScenicPanel,
  ColourTransmission,
  Circuit,
  DataLine,
  Invitation,
  Note,
  ShowReport,
  ShowReportFault,
  Revision,
};
