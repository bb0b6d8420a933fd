import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

export type UploadKind = "underlay" | "import" | "focus-photo";

/** A stored file. Underlays carry their calibration: metres per image pixel, plan offset, rotation, opacity, lock. */
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare kind: UploadKind;
  declare fileName: string;
  declare storageKey: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare widthPx: number | null;
  declare heightPx: number | null;
  declare metresPerPixel: CreationOptional<number>;
  declare offsetX: CreationOptional<number>;
  declare offsetY: CreationOptional<number>;
  declare rotationDeg: CreationOptional<number>;
  declare opacity: CreationOptional<number>;
  declare locked: CreationOptional<boolean>;
  declare uploadedBy: number | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initUpload(sequelize: Sequelize) {
  Upload.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      kind: { type: DataTypes.ENUM("underlay", "import", "focus-photo"), allowNull: false },
      fileName: { type: DataTypes.STRING(200), allowNull: false },
      storageKey: { type: DataTypes.STRING(200), allowNull: false },
      contentType: { type: DataTypes.STRING(60), allowNull: false },
      sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
      widthPx: { type: DataTypes.INTEGER, allowNull: true },
      heightPx: { type: DataTypes.INTEGER, allowNull: true },
      metresPerPixel: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.01 },
      offsetX: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      offsetY: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      rotationDeg: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      opacity: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.5 },
      locked: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      uploadedBy: { type: DataTypes.INTEGER, allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "uploads", underscored: true },
  );
}
