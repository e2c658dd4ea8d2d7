/** One rejected field, as the routes and the CLI report it: a dotted path and the reason. */
export interface DesignIssue {
  path: string;
  message: string;
}

/** Bad design input (a 400 on the routes, exit 2 on the CLI); every issue names its field. */
export class DesignInputError extends Error {
  readonly issues: DesignIssue[];
  constructor(issues: DesignIssue[]) {
    super(issues.map((i) => `${i.path || "(input)"}: ${i.message}`).join("\n"));
    this.name = "DesignInputError";
    this.issues = issues;
  }
}
