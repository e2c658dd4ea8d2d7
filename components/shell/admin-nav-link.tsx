import { Link } from "@/components/ui/link";
import { getSessionUser } from "@/lib/auth/session";

/** "Admin" in the header, for an admin only (the role is read on the server on each request). */
export async function AdminNavLink() {
  const user = await getSessionUser();
  if (user?.role !== "admin") return null;
  return (
    <Link
      href="/admin"
      className="inline-flex min-h-touch items-center rounded-lg border-2 border-spruce px-3 font-bold text-spruce no-underline hover:bg-spruce-light"
      data-testid="admin-link"
    >
      Admin
    </Link>
  );
}
