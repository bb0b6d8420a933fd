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
  NOTE_ORIGINS,
  NOTE_PRIORITIES,
  NOTE_STATUSES,
  NOTE_SUBJECTS,
  type NoteKind,
  type NoteOrigin,
  type NotePriority,
  type NoteStatus,
  type NoteSubject,
} from "./note-vocabulary";

/** A note from a rehearsal or a performance: a job for someone, on the production or one thing in it. */
export class Note extends Model<InferAttributes<Note>, InferCreationAttributes<Note>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare subject: NoteSubject;
  /** The position, fixture, cue or focus point; null for the production itself. */
  declare subjectId: number | null;
  declare body: string;
  declare kind: NoteKind;
  declare priority: CreationOptional<NotePriority>;
  declare ownerId: number | null;
  declare status: CreationOptional<NoteStatus>;
  declare needsAccess: CreationOptional<boolean>;
  declare needsDark: CreationOptional<boolean>;
  declare needsDesigner: CreationOptional<boolean>;
  declare needsIsolated: CreationOptional<boolean>;
  declare dueDate: string | null;
  declare dueSession: string | null;
  declare authorId: number;
  /** The production's current cue when the note was written (its number kept in case the cue goes). */
  declare runningCueId: number | null;
  declare runningCueNumber: string | null;
  declare origin: CreationOptional<NoteOrigin>;
  declare showReportId: number | null;
  declare closedBy: number | null;
  declare closedAt: Date | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initNote(sequelize: Sequelize) {
  Note.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      subject: { type: DataTypes.ENUM(...NOTE_SUBJECTS), allowNull: false },
      subjectId: { type: DataTypes.INTEGER, allowNull: true },
      body: { type: DataTypes.TEXT, allowNull: false },
      kind: { type: DataTypes.ENUM(...NOTE_KINDS), allowNull: false },
      priority: { type: DataTypes.ENUM(...NOTE_PRIORITIES), allowNull: false, defaultValue: "normal" },
      ownerId: { type: DataTypes.INTEGER, allowNull: true },
      status: { type: DataTypes.ENUM(...NOTE_STATUSES), allowNull: false, defaultValue: "open" },
      needsAccess: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      needsDark: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      needsDesigner: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      needsIsolated: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      dueDate: { type: DataTypes.DATEONLY, allowNull: true },
      dueSession: { type: DataTypes.STRING(80), allowNull: true },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      runningCueId: { type: DataTypes.INTEGER, allowNull: true },
      runningCueNumber: { type: DataTypes.STRING(20), allowNull: true },
      origin: { type: DataTypes.ENUM(...NOTE_ORIGINS), allowNull: false, defaultValue: "written" },
      showReportId: { type: DataTypes.INTEGER, allowNull: true },
      closedBy: { type: DataTypes.INTEGER, allowNull: true },
      closedAt: { type: DataTypes.DATE, allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "notes", underscored: true },
  );
}
