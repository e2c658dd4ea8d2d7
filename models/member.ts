import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { FlowState } from "@/lib/flow/state";
import type { Bearing, SupportDesign } from "@/lib/jobs/load-path";
import { JOB_MEMBER_KINDS, type JobMemberKind } from "@/lib/solver/design/kinds";
import type { MemberResultSummary } from "@/lib/flow/summary";
import type { MemberSpec } from "@/lib/solver/design/schema";
import type { Job } from "./job";

export const MEMBER_KIND_VALUES: readonly JobMemberKind[] = JOB_MEMBER_KINDS;

/**
 * One sized member of a job ("H1 kitchen header"): the flow's inputs, the answer as it was when
 * saved, and the member chosen. `carriedByMemberId` names the member that carries this one
 * (joists on a beam, a beam on a post), so its reactions can become that member's loads.
 */
export class Member extends Model<InferAttributes<Member>, InferCreationAttributes<Member>> {
  declare id: CreationOptional<string>;
  declare jobId: ForeignKey<string>;
  declare label: string;
  declare kind: JobMemberKind;
  /** the sizing flow's inputs; null for posts and footings (their inputs are in supportDesign) */
  declare flowState: FlowState | null;
  declare resultSummary: MemberResultSummary | null;
  declare chosenMember: MemberSpec | null;
  declare carriedByMemberId: CreationOptional<string | null>;
  declare sortOrder: CreationOptional<number>;
  /** width of floor or deck the joists repeat across, ft (to count them on the order list) */
  declare runWidthFt: CreationOptional<number | null>;
  /** posts under this member: height (ft) and nominal size ("6x6"); footings under them: diameter and depth (in) */
  declare postHeightFt: CreationOptional<number | null>;
  declare postSize: CreationOptional<string | null>;
  declare footingDiameterIn: CreationOptional<number | null>;
  declare footingDepthIn: CreationOptional<number | null>;
  /** where this member sits on the member carrying it (lib/jobs/load-path.ts) */
  declare bearing: CreationOptional<Bearing | null>;
  /** a post's or footing's inputs */
  declare supportDesign: CreationOptional<SupportDesign | null>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare job?: NonAttribute<Job>;
}

export function initMember(sequelize: Sequelize): void {
  Member.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      jobId: { type: DataTypes.UUID, allowNull: false },
      label: { type: DataTypes.STRING(120), allowNull: false },
      kind: { type: DataTypes.ENUM(...MEMBER_KIND_VALUES), allowNull: false },
      flowState: { type: DataTypes.JSONB, allowNull: true },
      resultSummary: { type: DataTypes.JSONB, allowNull: true },
      chosenMember: { type: DataTypes.JSONB, allowNull: true },
      carriedByMemberId: { type: DataTypes.UUID, allowNull: true },
      sortOrder: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      runWidthFt: { type: DataTypes.DOUBLE, allowNull: true },
      postHeightFt: { type: DataTypes.DOUBLE, allowNull: true },
      postSize: { type: DataTypes.STRING(20), allowNull: true },
      footingDiameterIn: { type: DataTypes.DOUBLE, allowNull: true },
      footingDepthIn: { type: DataTypes.DOUBLE, allowNull: true },
      bearing: { type: DataTypes.JSONB, allowNull: true },
      supportDesign: { type: DataTypes.JSONB, allowNull: true },
      deletedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "members", underscored: true },
  );
}
