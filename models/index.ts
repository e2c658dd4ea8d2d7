import type { Sequelize } from "sequelize";
import { initUser, User } from "./user";
import { AuthToken, initAuthToken } from "./auth-token";
import { initRateLimit } from "./rate-limit";
import { initMaterialTableModels } from "./material-tables";
import { initStripeCustomer } from "./stripe-customer";
import { initStripeEvent } from "./stripe-event";
import { initSubscription, Subscription } from "./subscription";
import { initJob, Job } from "./job";
import { initMember, Member } from "./member";
import { initMemberSave } from "./member-save";
import { initCrewLink } from "./crew-link";
import { initJobSheet } from "./job-sheet";

export { User, ROLES, type Role } from "./user";
export { AuthToken, AUTH_TOKEN_PURPOSES, type AuthTokenPurpose } from "./auth-token";
export { RateLimit } from "./rate-limit";
export * from "./material-tables";
export { Subscription, type SubscriptionStatus } from "./subscription";
export { StripeEvent } from "./stripe-event";
export { StripeCustomer } from "./stripe-customer";
export { Job } from "./job";
export { Member, MEMBER_KIND_VALUES } from "./member";
export { MemberSave } from "./member-save";
export { CrewLink } from "./crew-link";
export { JobSheet } from "./job-sheet";

/**
 * Initializes every model on a Sequelize instance, then wires the associations — all in this one place.
 * A new model: write models/<name>.ts with `init<Name>(sequelize)`, call it below, add its associations.
 */
export function initModels(sequelize: Sequelize): void {
  initUser(sequelize);
  initAuthToken(sequelize);
  initRateLimit(sequelize);
  initMaterialTableModels(sequelize);
  initSubscription(sequelize);
  initStripeEvent(sequelize);
  initStripeCustomer(sequelize);
  initJob(sequelize);
  initMember(sequelize);
  initMemberSave(sequelize);
  initCrewLink(sequelize);
  initJobSheet(sequelize);
  associate();
}

function associate(): void {
  User.hasMany(AuthToken, { foreignKey: "userId", as: "authTokens", onDelete: "CASCADE" });
  AuthToken.belongsTo(User, { foreignKey: "userId", as: "user" });
  User.hasMany(Subscription, { foreignKey: "userId", as: "subscriptions", onDelete: "CASCADE" });
  Subscription.belongsTo(User, { foreignKey: "userId", as: "user" });
  User.hasMany(Job, { foreignKey: "ownerId", as: "jobs", onDelete: "CASCADE" });
  Job.belongsTo(User, { foreignKey: "ownerId", as: "owner" });
  Job.hasMany(Member, { foreignKey: "jobId", as: "members", onDelete: "CASCADE" });
  Member.belongsTo(Job, { foreignKey: "jobId", as: "job" });
  Member.belongsTo(Member, { foreignKey: "carriedByMemberId", as: "carriedBy" });
  // Associations are added here as models land (jobs, members, sheets, table versions, subscriptions).
}
