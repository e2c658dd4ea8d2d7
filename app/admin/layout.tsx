import type { ReactNode } from "react";
import { adminForPage } from "@/lib/auth/guard";

// Admin area: tables and accounts. Every admin page and action checks the role again on its own: a layout
// is not re-run on every navigation, so it is a first gate, not the only one.
export default async function AdminLayout({ children }: { children: ReactNode }) {
  await adminForPage("/admin");
  return <div className="pb-8">{children}</div>;
}
