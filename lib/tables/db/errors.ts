/**
 * A change to the tables that cannot be made as asked: the route turns it into a 4xx with this message.
 * (lib/tables/db runs in scripts too, the seeders, so it does not use lib/http, which is server-only.)
 */
export class TablesChangeError extends Error {
  constructor(
    readonly status: 400 | 404 | 409,
    message: string,
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = "TablesChangeError";
  }
}
