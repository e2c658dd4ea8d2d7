import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { OrderListView } from "@/components/jobs/order-list-view";
import { OrderEmailForm, OrderToolbar } from "@/components/jobs/order-toolbar";
import { PageHeader } from "@/components/ui/page-header";
import { userForPage } from "@/lib/auth/guard";
import { getJobOrder } from "@/lib/orders/queries";
import { formatSheetDateTime } from "@/lib/sheets/format";

export const metadata: Metadata = { title: "Order list" };
export const dynamic = "force-dynamic";

type OrderRouteProps = { params: Promise<{ jobId: string }> };

const PRINT_CSS = `
@media print {
  @page { size: auto; margin: 12mm; }
  html, body { background: #fff !important; font-size: 10.5pt; }
  main { max-width: none !important; padding: 0 !important; }
  .order-keep { break-inside: avoid; }
}
`;

// GET /jobs/[jobId]/order — the job's order list from its members as they are now; 404 for anyone but the owner
export default async function OrderRoute({ params }: OrderRouteProps) {
  const { jobId } = await params;
  const user = await userForPage(`/jobs/${jobId}/order`);
  const order = await getJobOrder(user.id, jobId);
  if (!order) notFound();
  return (
    <div className="flex flex-col gap-5 pb-8">
      <style>{PRINT_CSS}</style>
      <PageHeader
        title={`Order list: ${order.job.name}`}
        lead={`${order.job.siteAddress ? `${order.job.siteAddress} · ` : ""}worked out ${formatSheetDateTime(order.computedAt)} from the members as they are now`}
        back={{ href: `/jobs/${order.job.id}`, label: order.job.name }}
      />
      <OrderToolbar jobId={order.job.id} />
      <OrderListView list={order.list} />
      <OrderEmailForm jobId={order.job.id} />
    </div>
  );
}
