import "server-only";
import { pathMemberOf } from "@/lib/jobs/load-path";
import { getJob, type JobView } from "@/lib/jobs/queries";
import { getCurrentTables } from "@/lib/tables/current";
import { jobOrderList } from "./job-order";
import type { OrderList } from "./order-list";

export interface JobOrder {
  job: Pick<JobView, "id" | "name" | "siteAddress">;
  list: OrderList;
  /** when the list was worked out (it is never stored), ISO 8601 */
  computedAt: string;
}

/** The order list of one of the owner's jobs from its live members and the current tables; null when the job is not theirs. */
export async function getJobOrder(ownerId: string, jobId: string, now: Date = new Date()): Promise<JobOrder | null> {
  const job = await getJob(ownerId, jobId);
  if (!job) return null;
  const tables = await getCurrentTables();
  const list = jobOrderList(
    job.members.map((m) => ({ ...pathMemberOf(m), orderDetails: m.orderDetails })),
    tables,
  );
  return { job: { id: job.id, name: job.name, siteAddress: job.siteAddress }, list, computedAt: now.toISOString() };
}
