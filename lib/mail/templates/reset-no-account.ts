import { renderMail, type RenderedMail } from "./layout";

export interface ResetNoAccountMailInput {
  /** The sign-up page, so the person can open an account with this address if they meant to. */
  signUpLink: string;
}

/**
 * Sent when a new password is asked for an address with no account. The page answers the same way either
 * way (nobody learns from it who has an account); the owner of the address learns it here.
 */
export function resetNoAccountMail({ signUpLink }: ResetNoAccountMailInput): RenderedMail {
  return renderMail("About your Spanlark password request", [
    { kind: "para", text: "Hello," },
    {
      kind: "para",
      text: "Someone asked to set a new Spanlark password for this address, but no Spanlark account uses it. Maybe you signed up with another address?",
    },
    { kind: "link", label: "Open an account", href: signUpLink },
    { kind: "para", text: "If you did not ask, ignore this mail; nothing has changed." },
  ]);
}
