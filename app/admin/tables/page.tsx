import type { Metadata } from "next";
import { SOURCE_LABEL } from "@/components/admin/tables/api";
import { When } from "@/components/admin/tables/when";
import { ButtonLink } from "@/components/ui/button";
import { CardLink } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { adminForPage } from "@/lib/auth/guard";
import { getCurrentTables } from "@/lib/tables/current";
import { getVersionInfo, isVersionId } from "@/lib/tables/db/queries";
import { tablesToRows } from "@/lib/tables/db/rows";
import { TABLE_KEYS, TABLE_SPECS } from "@/lib/tables/schemas";

export const metadata: Metadata = { title: "Material tables" };
export const dynamic = "force-dynamic";

export default async function AdminTablesPage() {
  await adminForPage("/admin/tables");
  const tables = await getCurrentTables();
  const rows = tablesToRows(tables);
  const version = isVersionId(tables.version) ? await getVersionInfo(tables.version) : null;

  return (
    <>
      <PageHeader
        title="Material tables"
        back={{ href: "/admin", label: "Admin" }}
        lead="Every size a builder gets is checked against these values. A change publishes a new version; job sheets keep the version they were made with."
        actions={
          <ButtonLink href="/admin/tables/history" variant="secondary">
            History and restore
          </ButtonLink>
        }
      />
      <section className="mb-6 rounded-card border-2 border-spruce bg-spruce-light p-4" data-testid="current-version">
        <h2 className="text-lg font-bold">{version ? `Current: version ${version.number}` : "Current: the starter tables (not yet in the database)"}</h2>
        {version ? (
          <p className="text-ink-soft">
            {SOURCE_LABEL[version.source]} · <When iso={version.createdAt} /> · {version.createdBy?.email ?? "Spanlark"} — {version.note}
          </p>
        ) : (
          <p className="text-ink-soft">Run the seeders to publish them as version 1, so edits and imports can follow.</p>
        )}
      </section>
      <h2 className="mb-3 text-xl font-bold">Tables</h2>
      <div className="grid grid-cols-1 gap-3 md:grid-cols-2">
        {TABLE_KEYS.map((key) => (
          <CardLink key={key} href={`/admin/tables/${key}`} title={TABLE_SPECS[key].title}>
            {TABLE_SPECS[key].description} · {rows[key].length} rows
          </CardLink>
        ))}
      </div>
    </>
  );
}
