import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { TableBrowser } from "@/components/admin/tables/table-browser";
import { PageHeader } from "@/components/ui/page-header";
import { adminForPage } from "@/lib/auth/guard";
import { isTableKey, TABLE_SPECS } from "@/lib/tables/schemas";

export const dynamic = "force-dynamic";

type TablePageProps = { params: Promise<{ table: string }> };

export async function generateMetadata({ params }: TablePageProps): Promise<Metadata> {
  const { table } = await params;
  return { title: isTableKey(table) ? TABLE_SPECS[table].title : "Material tables" };
}

export default async function AdminTablePage({ params }: TablePageProps) {
  const { table } = await params;
  await adminForPage(`/admin/tables/${table}`);
  if (!isTableKey(table)) notFound();
  const spec = TABLE_SPECS[table];
  return (
    <>
      <PageHeader title={spec.title} back={{ href: "/admin/tables", label: "Material tables" }} lead={spec.description} />
      <TableBrowser table={table} />
    </>
  );
}
