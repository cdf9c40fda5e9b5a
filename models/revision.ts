import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import type { FrozenBlock, FrozenApproval } from '@/lib/revisions/revision-record';
import type { Memo } from './memo';
import type { User } from './user';

/** A frozen revision: immutable (refused by the API, and by triggers on SQLite). */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare letter: string;
  declare memoVersion: number;
  declare documentNumber: string;
  declare title: string;
  declare content: TiptapDoc;
  declare blocks: FrozenBlock[];
  declare engineVersion: string;
  declare constants: unknown[];
  declare figures: unknown[];
  declare approval: FrozenApproval;
  declare changeSummary: string;
  declare pdfData: Buffer;
  declare pdfSha256: string;
  /** CCSDS OPM (KVN) of the design orbit and its SHA-256; null when the memo has none or for revisions frozen before. */
  declare opmKvn: CreationOptional<string | null>;
  declare opmSha256: CreationOptional<string | null>;
  /** CCSDS OEM (KVN) of the design orbit's numerical check and its SHA-256. */
  declare oemKvn: CreationOptional<string | null>;
  declare oemSha256: CreationOptional<string | null>;
  declare frozenBy: ForeignKey<User['id']>;
  declare frozenAt: Date;

  static initModel(sequelize: Sequelize): typeof Revision {
    Revision.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        letter: { type: DataTypes.STRING(4), allowNull: false },
        memoVersion: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_version' },
        documentNumber: { type: DataTypes.STRING(64), allowNull: false, field: 'document_number' },
        title: { type: DataTypes.STRING(300), allowNull: false },
        content: { type: DataTypes.JSON, allowNull: false, field: 'content_json' },
        blocks: { type: DataTypes.JSON, allowNull: false, field: 'blocks_json' },
        engineVersion: { type: DataTypes.STRING(64), allowNull: false, field: 'engine_version' },
        constants: { type: DataTypes.JSON, allowNull: false, field: 'constants_json' },
        figures: { type: DataTypes.JSON, allowNull: false, field: 'figures_json' },
        approval: { type: DataTypes.JSON, allowNull: false, field: 'approval_json' },
        changeSummary: { type: DataTypes.TEXT, allowNull: false, field: 'change_summary' },
        pdfData: { type: DataTypes.BLOB, allowNull: false, field: 'pdf_data' },
        pdfSha256: { type: DataTypes.STRING(64), allowNull: false, field: 'pdf_sha256' },
        opmKvn: { type: DataTypes.TEXT, allowNull: true, field: 'opm_kvn' },
        opmSha256: { type: DataTypes.STRING(64), allowNull: true, field: 'opm_sha256' },
        oemKvn: { type: DataTypes.TEXT, allowNull: true, field: 'oem_kvn' },
        oemSha256: { type: DataTypes.STRING(64), allowNull: true, field: 'oem_sha256' },
        frozenBy: { type: DataTypes.INTEGER, allowNull: false, field: 'frozen_by' },
        frozenAt: { type: DataTypes.DATE, allowNull: false, field: 'frozen_at' },
      },
      { sequelize, tableName: 'revisions', modelName: 'Revision', timestamps: false },
    );
    return Revision;
  }
}
