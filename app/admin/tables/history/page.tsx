import type { Metadata } from "next";
import { VersionHistory } from "@/components/admin/tables/version-history";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { adminForPage } from "@/lib/auth/guard";
import { getSequelize } from "@/lib/db";
import { listVersions } from "@/lib/tables/db/queries";
import { TABLE_KEYS, TABLE_SPECS, type TableKey } from "@/lib/tables/schemas";

export const metadata: Metadata = { title: "Table history" };
export const dynamic = "force-dynamic";

export default async function AdminTablesHistoryPage() {
  await adminForPage("/admin/tables/history");
  getSequelize();
  const { versions, total } = await listVersions({ limit: 100 });
  const titles = Object.fromEntries(TABLE_KEYS.map((k) => [k, TABLE_SPECS[k].title])) as Record<TableKey, string>;
  return (
    <>
      <PageHeader
        title="Table history"
        back={{ href: "/admin/tables", label: "Material tables" }}
        lead="Every published version, newest first. Restoring an earlier one publishes a copy of it as the newest; nothing is ever overwritten."
      />
      {versions.length === 0 ? (
        <EmptyState title="No versions yet" body="Run the seeders to publish the starter tables as version 1." />
      ) : (
        <>
          <VersionHistory versions={versions} titles={titles} />
          {total > versions.length ? (
            <p className="mt-3 text-graphite">
              Showing the newest {versions.length} of {total} versions.
            </p>
          ) : null}
        </>
      )}
    </>
  );
}
