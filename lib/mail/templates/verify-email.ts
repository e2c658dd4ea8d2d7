import { greeting, renderMail, type RenderedMail } from "./layout";

export interface VerifyEmailMailInput {
  name: string;
  /** The full confirmation link, e.g. https://spanlark.example/verify?token=… */
  link: string;
  /** How long the link works, in hours (48). */
  validHours: number;
}

/** Sent after sign-up (and on "send it again"): confirms the address belongs to the person signing up. */
export function verifyEmailMail({ name, link, validHours }: VerifyEmailMailInput): RenderedMail {
  return renderMail("Confirm your e-mail for Spanlark", [
    { kind: "para", text: greeting(name) },
    {
      kind: "para",
      text: "Thanks for opening a Spanlark account. Tap the button to confirm this is your address, then sign in to save jobs and share them with your crew.",
    },
    { kind: "link", label: "Confirm my e-mail", href: link },
    {
      kind: "para",
      text: `The link works once and for ${validHours} hours. If you did not sign up, ignore this mail: no account opens without the confirmation.`,
    },
  ]);
}
