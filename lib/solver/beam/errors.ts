/** One rejected field: a dotted path (e.g. "supports.1.x") and the reason, in plain words. */
export interface InputIssue {
  path: string;
  message: string;
}

/** The input is malformed or out of range; every issue names its field. */
export class BeamInputError extends Error {
  readonly issues: InputIssue[];
  constructor(issues: InputIssue[]) {
    super(issues.map((i) => `${i.path || "(input)"}: ${i.message}`).join("\n"));
    this.name = "BeamInputError";
    this.issues = issues;
  }
}

/** The supports cannot hold the beam still; the message says why and what to add. */
export class BeamInstabilityError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "BeamInstabilityError";
  }
}

/** A position in ft for messages: at most 4 decimals, no trailing zeros. */
export function formatFt(x: number): string {
  return String(Math.round(x * 1e4) / 1e4);
}
