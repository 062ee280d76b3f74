/**
 * initModels(sequelize): initialise every model, then every association.
 * Called on every evaluation of lib/db/sequelize.ts (never only when the instance is created).
 */
import type { Sequelize } from "sequelize";
import { Team } from "./team";
import { User } from "./user";
import { SignInThrottle } from "./sign-in-throttle";
import { Invitation } from "./invitation";
import { Tour } from "./tour";
import { TourRevision } from "./tour-revision";
import { Comment } from "./comment";
import { CustomBody } from "./custom-body";
import { MailMessage } from "./mail-message";
import { AuditEvent } from "./audit-event";

export { Team, User, SignInThrottle, Invitation, Tour, TourRevision, Comment, CustomBody, MailMessage, AuditEvent };
export { ROLES, type Role } from "./user";
export { TOUR_STATUSES, type TourStatus } from "./tour";

export function initModels(sequelize: Sequelize): void {
  for (const m of [Team, User, SignInThrottle, Invitation, Tour, TourRevision, Comment, CustomBody, MailMessage, AuditEvent]) {
    m.initModel(sequelize);
  }
  Team.hasMany(User, { foreignKey: "teamId" });
  User.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  Team.hasMany(Tour, { foreignKey: "teamId" });
  Tour.belongsTo(User, { foreignKey: "ownerId", as: "owner" });
  Tour.hasMany(TourRevision, { foreignKey: "tourId", as: "revisions" });
  TourRevision.belongsTo(User, { foreignKey: "authorId", as: "author", constraints: false });
  Tour.hasMany(Comment, { foreignKey: "tourId", as: "comments" });
  Comment.belongsTo(User, { foreignKey: "authorId", as: "author", constraints: false });
  Invitation.belongsTo(Team, { foreignKey: "teamId" });
  CustomBody.belongsTo(Team, { foreignKey: "teamId" });
  MailMessage.belongsTo(Team, { foreignKey: "teamId" });
  AuditEvent.belongsTo(Team, { foreignKey: "teamId" });
  AuditEvent.belongsTo(User, { foreignKey: "actorId", as: "actor", constraints: false });
}
