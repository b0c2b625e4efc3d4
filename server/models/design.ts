import { DataTypes, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Model, type ModelStatic, type Sequelize } from 'sequelize';
import { DESIGN_STATUSES, type DesignStatus } from '@/shared/api/designs';

/** A team's design. `status` follows its latest reviewed version (services/review-state.ts). */
export interface DesignRow extends Model<InferAttributes<DesignRow>, InferCreationAttributes<DesignRow>> {
  id: CreationOptional<number>;
  teamId: number;
  name: string;
  site: string | null;
  status: DesignStatus;
  createdById: number | null;
  createdAt: Date;
  updatedAt: Date;
}

export function defineDesign(sequelize: Sequelize): ModelStatic<DesignRow> {
  return sequelize.define<DesignRow>(
    'Design',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      site: { type: DataTypes.STRING(120), allowNull: true },
      status: { type: DataTypes.STRING(24), allowNull: false, validate: { isIn: [DESIGN_STATUSES as unknown as string[]] } },
      createdById: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: { type: DataTypes.DATE, allowNull: false },
      updatedAt: { type: DataTypes.DATE, allowNull: false },
    },
    // Times come from the services' clock (the seed backdates the demo history), not from Sequelize.
    { tableName: 'designs', timestamps: false },
  );
}
