import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** The stage manager's report after one performance. */
export class ShowReport extends Model<InferAttributes<ShowReport>, InferCreationAttributes<ShowReport>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare performance: string;
  declare performedOn: string;
  declare summary: string;
  declare authorId: number;
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

export function initShowReport(sequelize: Sequelize) {
  ShowReport.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      performance: { type: DataTypes.STRING(80), allowNull: false },
      performedOn: { type: DataTypes.DATEONLY, allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
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
}
