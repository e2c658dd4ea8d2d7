import type { ReactNode } from "react";

// Sign-in, sign-up and the mailed-link pages: one narrow column, easy to fill in with a thumb.
export default function AuthLayout({ children }: { children: ReactNode }) {
  return <div className="mx-auto flex w-full max-w-md flex-col pb-10">{children}</div>;
}
