import type { Sequelize } from "sequelize";
import { initAuditModel } from "@server/db/models/audit";
import { Comment, initCommentModel } from "@server/db/models/comment";
import { Diagram, DiagramVersion, initDiagramModels } from "@server/db/models/diagram";
import { ShareLink, initShareLinkModel } from "@server/db/models/shareLink";
import { Invitation, Membership, Team, initTeamModels } from "@server/db/models/team";
import { User, initUser } from "@server/db/models/user";

/** Registers every model and their associations on one Sequelize instance. */
export function initModels(sequelize: Sequelize): void {
  initUser(sequelize);
  initTeamModels(sequelize);
  initDiagramModels(sequelize);
  initAuditModel(sequelize);
  initShareLinkModel(sequelize);
  initCommentModel(sequelize);
  Membership.belongsTo(User, { foreignKey: "userId", as: "user" });
  Membership.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  Team.hasMany(Membership, { foreignKey: "teamId", as: "memberships" });
  Invitation.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  Invitation.belongsTo(User, { foreignKey: "invitedBy", as: "inviter" });
  Diagram.belongsTo(User, { foreignKey: "createdBy", as: "creator" });
  Diagram.hasMany(DiagramVersion, { foreignKey: "diagramId", as: "versions" });
  DiagramVersion.belongsTo(User, { foreignKey: "createdBy", as: "author" });
  ShareLink.belongsTo(Diagram, { foreignKey: "diagramId", as: "diagram" });
  ShareLink.belongsTo(User, { foreignKey: "createdBy", as: "creator" });
  Comment.belongsTo(User, { foreignKey: "authorId", as: "author" });
  Comment.belongsTo(User, { foreignKey: "resolvedBy", as: "resolver" });
}
