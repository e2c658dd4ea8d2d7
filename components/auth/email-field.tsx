import { TextField, type TextFieldProps } from "@/components/ui/field";

export type EmailFieldProps = Omit<TextFieldProps, "label" | "type">;

/** The e-mail field of the sign-in, sign-up and forgot-password forms: the phone's e-mail keyboard, no capitals, no spell check. */
export function EmailField(props: EmailFieldProps) {
  return <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" autoCapitalize="none" spellCheck={false} {...props} />;
}
