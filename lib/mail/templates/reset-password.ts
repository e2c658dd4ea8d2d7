import { greeting, renderMail, type RenderedMail } from "./layout";

export interface ResetPasswordMailInput {
  name: string;
  /** The full link to the new-password page, e.g. https://spanlark.example/reset-password?token=… */
  link: string;
  /** How long the link works, in minutes (60). */
  validMinutes: number;
}

/** Sent when someone asks for a new password for an address that has an account. */
export function resetPasswordMail({ name, link, validMinutes }: ResetPasswordMailInput): RenderedMail {
  return renderMail("Set a new Spanlark password", [
    { kind: "para", text: greeting(name) },
    { kind: "para", text: "Someone (we hope you) asked to set a new password for your Spanlark account. Tap the button and choose one." },
    { kind: "link", label: "Choose a new password", href: link },
    {
      kind: "para",
      text: `The link works once and for ${validMinutes} minutes. If you did not ask, ignore this mail: your password stays as it is.`,
    },
  ]);
}
