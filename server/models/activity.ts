import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One thing that happened to a sketch: who (null for the system), what, and a short detail. */
export class Activity extends Model<InferAttributes<Activity>, InferCreationAttributes<Activity>> {
  declare id: CreationOptional<string>
  declare sketchId: string
  declare actorId: string | null
  declare action: string
  declare detail: CreationOptional<string>
  declare createdAt: CreationOptional<Date>
}

/** Binds the Activity model to the connection. */
export function initActivity(sequelize: Sequelize): typeof Activity {
  Activity.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      sketchId: { type: DataTypes.UUID, allowNull: false },
      actorId: { type: DataTypes.UUID, allowNull: true },
      action: { type: DataTypes.STRING(32), allowNull: false },
      detail: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'activities', updatedAt: false },
  )
  return Activity
}
