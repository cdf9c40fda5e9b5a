import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One entry of the audit trail (who, what, when, which memo/revision); never changed. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare at: Date;
  declare actorId: number | null;
  declare actorEmail: string | null;
  declare action: string;
  declare memoId: number | null;
  declare revisionLetter: string | null;
  declare details: Record<string, unknown> | null;

  static initModel(sequelize: Sequelize): typeof AuditEvent {
    AuditEvent.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        at: { type: DataTypes.DATE, allowNull: false },
        actorId: { type: DataTypes.INTEGER, allowNull: true, field: 'actor_id' },
        actorEmail: { type: DataTypes.STRING(320), allowNull: true, field: 'actor_email' },
        action: { type: DataTypes.STRING(40), allowNull: false },
        memoId: { type: DataTypes.INTEGER, allowNull: true, field: 'memo_id' },
        revisionLetter: { type: DataTypes.STRING(4), allowNull: true, field: 'revision_letter' },
        details: { type: DataTypes.JSON, allowNull: true, field: 'details_json' },
      },
      { sequelize, tableName: 'audit_events', modelName: 'AuditEvent', timestamps: false },
    );
    return AuditEvent;
  }
}
