import type { Metadata } from "next";
import { CardLink } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { adminForPage } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Admin" };
export const dynamic = "force-dynamic";

export default async function AdminHomePage() {
  await adminForPage("/admin");
  return (
    <>
      <PageHeader title="Admin" lead="The material tables every answer depends on, and the accounts that use Spanlark." />
      <div className="flex flex-col gap-3">
        <CardLink href="/admin/tables" title="Material tables">
          Lumber and steel values, CSV import, and every published version with its history
        </CardLink>
        <CardLink href="/admin/users" title="Accounts">
          Find an account, give or take away the admin role
        </CardLink>
      </div>
    </>
  );
}
