import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import {
  NOTE_KINDS,
  NOTE_PRIORITIES,
  NOTE_SUBJECTS,
  type NoteKind,
  type NotePriority,
  type NoteSubject,
} from "./note-vocabulary";

/** The stage manager's report after one performance. */
export class ShowReport extends Model<InferAttributes<ShowReport>, InferCreationAttributes<ShowReport>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare performance: string;
  declare performedOn: string;
  declare summary: string;
  declare authorId: number;
  /** When it went to the team (its items became notes); null while it is a draft the stage manager edits. */
  declare sentAt: Date | null;
  declare sentBy: number | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** One lamp out or fault seen in that performance. */
export class ShowReportFault extends Model<InferAttributes<ShowReportFault>, InferCreationAttributes<ShowReportFault>> {
  declare id: CreationOptional<number>;
  declare showReportId: number;
  declare fixtureId: number | null;
  declare kind: "lamp_out" | "fault";
  declare description: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** One lighting item of a report: held while the report is a draft, written as a note when it is sent. */
export class ShowReportItem extends Model<InferAttributes<ShowReportItem>, InferCreationAttributes<ShowReportItem>> {
  declare id: CreationOptional<number>;
  declare showReportId: number;
  declare sortOrder: number;
  declare body: string;
  declare kind: NoteKind;
  declare subject: NoteSubject;
  declare subjectId: number | null;
  declare priority: NotePriority | null;
  declare ownerId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** Sets up the report, its fault log and its items (the items ride here so models/index.ts needs no new line). */
export function initShowReport(sequelize: Sequelize) {
  ShowReport.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      performance: { type: DataTypes.STRING(80), allowNull: false },
      performedOn: { type: DataTypes.DATEONLY, allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      sentAt: { type: DataTypes.DATE, allowNull: true },
      sentBy: { type: DataTypes.INTEGER, allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "show_reports", underscored: true },
  );
  ShowReportFault.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      showReportId: { type: DataTypes.INTEGER, allowNull: false },
      fixtureId: { type: DataTypes.INTEGER, allowNull: true },
      kind: { type: DataTypes.ENUM("lamp_out", "fault"), allowNull: false },
      description: { type: DataTypes.STRING(300), allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "show_report_faults", underscored: true },
  );
  ShowReportItem.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      showReportId: { type: DataTypes.INTEGER, allowNull: false },
      sortOrder: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      body: { type: DataTypes.TEXT, allowNull: false },
      kind: { type: DataTypes.ENUM(...NOTE_KINDS), allowNull: false },
      subject: { type: DataTypes.ENUM(...NOTE_SUBJECTS), allowNull: false },
      subjectId: { type: DataTypes.INTEGER, allowNull: true },
      priority: { type: DataTypes.ENUM(...NOTE_PRIORITIES), allowNull: true },
      ownerId: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    // Named outright: lib/data reads it from the instance's registry by this name, and a minified build renames classes.
    { sequelize, tableName: "show_report_items", modelName: "ShowReportItem", underscored: true },
  );
}
