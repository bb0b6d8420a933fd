import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

export type ShutterCut = {
  label: "top" | "bottom" | "left" | "right";
  a: { x: number; y: number };
  b: { x: number; y: number };
};
export type AimHeight = "deck" | "head";

/** One fixture (or one cell of a multi-cell body, grouped by bodyKey). */
export class Fixture extends Model<InferAttributes<Fixture>, InferCreationAttributes<Fixture>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare positionId: number;
  declare fixtureTypeId: number;
  declare focusPointId: number | null;
  declare unitNumber: string;
  declare unitSort: string;
  declare bodyKey: string | null;
  declare cell: number | null;
  declare channel: number | null;
  declare universe: number | null;
  declare address: number | null;
  declare dmxMode: string | null;
  declare footprint: number | null;
  declare circuit: string | null;
  declare dimmer: string | null;
  declare colour: string | null;
  declare gobo: string | null;
  declare purpose: string | null;
  declare x: number;
  declare y: number;
  declare lensHeight: number | null;
  declare focusX: number | null;
  declare focusY: number | null;
  declare aim: CreationOptional<AimHeight>;
  declare coneDeg: number | null;
  declare softnessDeg: number | null;
  declare shutterCuts: ShutterCut[] | null;
  declare irisPercent: number | null;
  declare notes: string | null;
  declare focusNotes: string | null;
  declare focusPhotoUploadId: number | null;
  declare goboRotationDeg: number | null;
  declare barnDoorTop: string | null;
  declare barnDoorBottom: string | null;
  declare barnDoorLeft: string | null;
  declare barnDoorRight: string | null;
  declare hung: CreationOptional<boolean>;
  declare focused: CreationOptional<boolean>;
  declare focusedAt: Date | null;
  declare focusedBy: number | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initFixture(sequelize: Sequelize) {
  // Fresh objects each time: Sequelize writes the column name into an attribute's definition object.
  const int = () => ({ type: DataTypes.INTEGER, allowNull: true });
  const dbl = () => ({ type: DataTypes.DOUBLE, allowNull: true });
  const str = (n: number) => ({ type: DataTypes.STRING(n), allowNull: true });
  Fixture.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      positionId: { type: DataTypes.INTEGER, allowNull: false },
      fixtureTypeId: { type: DataTypes.INTEGER, allowNull: false },
      focusPointId: int(),
      unitNumber: { type: DataTypes.STRING(12), allowNull: false },
      unitSort: { type: DataTypes.STRING(40), allowNull: false },
      bodyKey: str(40),
      cell: int(),
      channel: int(),
      universe: int(),
      address: int(),
      dmxMode: str(40),
      footprint: int(),
      circuit: str(20),
      dimmer: str(20),
      colour: str(60),
      gobo: str(60),
      purpose: str(120),
      x: { type: DataTypes.DOUBLE, allowNull: false },
      y: { type: DataTypes.DOUBLE, allowNull: false },
      lensHeight: dbl(),
      focusX: dbl(),
      focusY: dbl(),
      aim: { type: DataTypes.ENUM("deck", "head"), allowNull: false, defaultValue: "deck" },
      coneDeg: dbl(),
      softnessDeg: dbl(),
      shutterCuts: { type: DataTypes.JSON, allowNull: true },
      irisPercent: dbl(),
      notes: { type: DataTypes.TEXT, allowNull: true },
      focusNotes: { type: DataTypes.TEXT, allowNull: true },
      focusPhotoUploadId: int(),
      goboRotationDeg: dbl(),
      barnDoorTop: str(60),
      barnDoorBottom: str(60),
      barnDoorLeft: str(60),
      barnDoorRight: str(60),
      hung: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      focused: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      focusedAt: { type: DataTypes.DATE, allowNull: true },
      focusedBy: int(),
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "fixtures", underscored: true },
  );
}
