import { greeting, renderMail, type RenderedMail } from "./layout";

export interface AccountExistsMailInput {
  name: string;
  signInLink: string;
  resetLink: string;
}

/**
 * Sent when someone signs up with an address that already has an account. The sign-up page answers as it
 * always does ("check your e-mail"), so it does not tell a stranger the address is taken.
 */
export function accountExistsMail({ name, signInLink, resetLink }: AccountExistsMailInput): RenderedMail {
  return renderMail("You already have a Spanlark account", [
    { kind: "para", text: greeting(name) },
    { kind: "para", text: "Someone tried to open a new Spanlark account with this address. You already have one, so nothing new was opened." },
    { kind: "link", label: "Sign in", href: signInLink },
    { kind: "link", label: "Forgot your password? Choose a new one", href: resetLink },
    { kind: "para", text: "If it was not you, ignore this mail: your account is unchanged." },
  ]);
}
