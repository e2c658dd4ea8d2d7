import "server-only";
import { designSpecOf } from "@/lib/flow/summary";
import { getJob, type JobView } from "@/lib/jobs/queries";
import { getCurrentTables } from "@/lib/tables/current";
import { buildOrderList, notCountedNotes, type OrderList } from "./order-list";

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
  const list = buildOrderList(
    // posts and footings added on the load path are checked on the job page but not counted here yet: the list says so
    job.members
      .flatMap((m) => (m.flowState === null || m.kind === "post" || m.kind === "footing" ? [] : [{ ...m, flowState: m.flowState, kind: m.kind }]))
      .map((m) => ({
        label: m.label,
        kind: m.kind,
        flowState: m.flowState,
        spec: m.chosenMember ?? designSpecOf(m.resultSummary),
        summary: m.resultSummary,
        details: m.orderDetails,
      })),
    tables,
  );
  list.missing.push(...notCountedNotes(job.members));
  return { job: { id: job.id, name: job.name, siteAddress: job.siteAddress }, list, computedAt: now.toISOString() };
}
