import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { UserList } from "@/components/admin/users/user-list";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { TextField } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page-header";
import { listUsers, USERS_PAGE_SIZE } from "@/lib/auth/accounts";
import { adminForPage } from "@/lib/auth/guard";
import { UserSearchSchema } from "@/lib/auth/schemas";

export const metadata: Metadata = { title: "Accounts" };
export const dynamic = "force-dynamic";

type UsersPageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function AdminUsersPage({ searchParams }: UsersPageProps) {
  const admin = await adminForPage("/admin/users");
  const parsed = UserSearchSchema.safeParse(await searchParams);
  const { q, page } = parsed.success ? parsed.data : { q: "", page: 1 };
  const { users, total } = await listUsers({ q, page });
  const pages = Math.max(1, Math.ceil(total / USERS_PAGE_SIZE));
  const pageHref = (n: number) => `/admin/users?${new URLSearchParams({ ...(q ? { q } : {}), page: String(n) })}`;

  return (
    <>
      <PageHeader title="Accounts" back={{ href: "/admin", label: "Admin" }} lead="Find an account by e-mail, name or company." />
      <form method="get" role="search" className="mb-4 flex items-end gap-2">
        <TextField label="Search" name="q" type="search" defaultValue={q} containerClassName="flex-1" autoCapitalize="none" spellCheck={false} />
        <Button type="submit">Search</Button>
      </form>
      {!parsed.success ? <p className="mb-3 font-bold text-over-ink">The search was too long; showing every account.</p> : null}
      <p className="mb-3 text-ink-soft" aria-live="polite">
        {total === 0 ? "No account matches." : `${total} account${total === 1 ? "" : "s"}${q ? ` matching “${q}”` : ""}.`}
      </p>
      {users.length === 0 ? (
        <EmptyState
          title="No account matches"
          body="Try part of the e-mail address, a first name or the company."
          action={
            <Link href="/admin/users" className="font-bold">
              Show every account
            </Link>
          }
        />
      ) : (
        <UserList currentUserId={admin.id} users={users.map((u) => ({ ...u, createdAt: u.createdAt.toISOString() }))} />
      )}
      {pages > 1 ? (
        <nav aria-label="Pages" className="mt-4 flex items-center justify-between gap-2">
          {page > 1 ? (
            <Link href={pageHref(page - 1)} className="inline-flex min-h-touch items-center font-bold">
              Newer
            </Link>
          ) : (
            <span />
          )}
          <span className="text-ink-soft">
            Page {page} of {pages}
          </span>
          {page < pages ? (
            <Link href={pageHref(page + 1)} className="inline-flex min-h-touch items-center font-bold">
              Older
            </Link>
          ) : (
            <span />
          )}
        </nav>
      ) : null}
    </>
  );
}
