import type { Sequelize } from "sequelize";
import { initUser } from "./user";

export { User, ROLES, type Role } from "./user";

/**
 * Initialises every model on a Sequelize instance, then wires the associations — all in this one place.
 * A new model: write models/<name>.ts with `init<Name>(sequelize)`, call it below, add its associations.
 */
export function initModels(sequelize: Sequelize): void {
  initUser(sequelize);
  associate();
}

function associate(): void {
  // Associations are added here as models land (jobs, members, sheets, table versions, subscriptions).
}
