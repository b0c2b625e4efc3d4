import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type ModelStatic, type Sequelize } from 'sequelize';

/**
 * One immutable version of a design: the topology document as JSON text, the analysis summary and full
 * report taken when it was saved (JSON text), and the sha256 of the document's canonical JSON. Rows are only ever
 * inserted; the table's triggers refuse updates and deletes (migration 0005), and so do these hooks.
 */
export interface DesignVersionRow extends Model<InferAttributes<DesignVersionRow>, InferCreationAttributes<DesignVersionRow>> {
  id: CreationOptional<number>;
  designId: number;
  number: number;
  document: string;
  message: string;
  authorId: number;
  summary: string;
  contentHash: string;
  /** The full analysis report as JSON text; null on versions saved before reports were stored (migration 0006). */
  report: CreationOptional<string | null>;
  /** afterOneFailure as JSON text; null before migration 0011 and when it did not finish in the save's budget. */
  afterOne: CreationOptional<string | null>;
  createdAt: Date;
}

export function defineDesignVersion(sequelize: Sequelize): ModelStatic<DesignVersionRow> {
  const model = sequelize.define<DesignVersionRow>(
    'DesignVersion',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      designId: { type: DataTypes.INTEGER, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      document: { type: DataTypes.TEXT, allowNull: false },
      message: { type: DataTypes.STRING(500), allowNull: false },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      contentHash: { type: DataTypes.STRING(64), allowNull: false },
      report: { type: DataTypes.TEXT, allowNull: true },
      afterOne: { type: DataTypes.TEXT, allowNull: true },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    { tableName: 'design_versions', timestamps: false },
  );
  refuseChanges(model, 'A saved version never changes; save a new version instead.');
  return model;
}

/** Make a model insert-only at the ORM level too, so a mistaken update fails in tests before it reaches the trigger. */
export function refuseChanges<M extends Model>(model: ModelStatic<M>, message: string): void {
  const refuse = () => {
    throw new Error(message);
  };
  model.addHook('beforeUpdate', refuse);
  model.addHook('beforeBulkUpdate', refuse);
  model.addHook('beforeDestroy', refuse);
  model.addHook('beforeBulkDestroy', refuse);
}
