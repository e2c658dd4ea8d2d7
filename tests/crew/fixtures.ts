// Shared fixtures for the crew link and job sheet tests (and their access-table rows): accounts, a job of the
// invented Marsh Lane scenario, and members saved the way the sizing flow saves them (inputs, chosen size
// and the answer's summary worked out by the real checks on the starter tables).
import { randomUUID } from "node:crypto";
import { defaultFlowState } from "@/lib/flow/defaults";
import { checkRequest } from "@/lib/flow/request";
import type { FlowState } from "@/lib/flow/state";
import { summarize } from "@/lib/flow/summary";
import { checkMember } from "@/lib/solver/design/check";
import type { MemberSpec } from "@/lib/solver/design/schema";
import { STARTER_TABLES } from "@/lib/tables";
import type { MaterialTables } from "@/lib/tables/types";

export const TEST_DB = process.env.TEST_DATABASE_URL;
if (TEST_DB) process.env.DATABASE_URL = TEST_DB;
process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";
process.env.APP_URL ??= "http://127.0.0.1:3100";

export type Role = "builder" | "subscriber" | "admin";

/** A 10 ft header under a bearing wall (roof dead, roof live and snow over 13 ft; the wall's own weight). */
export function headerState(): FlowState {
  return {
    ...defaultFlowState("header"),
    lengthFt: 10,
    supports: [
      { x: 0, type: "pin" },
      { x: 10, type: "roller" },
    ],
    lineLoads: [],
  };
}

/** A 13 ft floor joist at 16 in on center, 40 psf live and 10 psf dead. */
export function joistState(): FlowState {
  return {
    ...defaultFlowState("floor-joist"),
    lengthFt: 13,
    supports: [
      { x: 0, type: "pin" },
      { x: 13, type: "roller" },
    ],
  };
}

export const HEADER_SPEC: MemberSpec = { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x12", plies: 3 };
export const JOIST_SPEC: MemberSpec = { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10", plies: 1 };

export function summaryFor(state: FlowState, spec: MemberSpec, tables: MaterialTables = STARTER_TABLES) {
  return summarize(state, checkMember(checkRequest(state, spec), tables));
}

export async function makeAccount(role: Role = "builder", tag = "crew") {
  const { getSequelize } = await import("@/lib/db");
  const { User } = await import("@/models/user");
  getSequelize();
  return User.create({
    email: `${tag}-${randomUUID().slice(0, 8)}@crew-sheets.test`,
    passwordHash: "not-a-hash",
    name: role === "subscriber" ? "Sam Hollis" : "Dee Rowe",
    company: "Hollis & Rowe Framing",
    role,
    emailVerifiedAt: new Date(),
  });
}

/** A job with a header and a floor joist, both sized, and a third member not sized yet. */
export async function makeJob(ownerId: string, options: { unsized?: boolean } = {}) {
  const { getSequelize } = await import("@/lib/db");
  const { Job } = await import("@/models/job");
  const { Member } = await import("@/models/member");
  getSequelize();
  const job = await Job.create({
    ownerId,
    name: "Marsh Lane addition",
    siteAddress: "14 Marsh Lane, Larkfield",
    notes: "Kitchen opening widened; new joists over the family room.",
  });
  const h = headerState();
  const j = joistState();
  const header = await Member.create({
    jobId: job.id,
    label: "H1 kitchen header",
    kind: "header",
    flowState: h,
    chosenMember: HEADER_SPEC,
    resultSummary: summaryFor(h, HEADER_SPEC),
    sortOrder: 0,
  });
  const joist = await Member.create({
    jobId: job.id,
    label: "J1 family room joists",
    kind: "floor-joist",
    flowState: j,
    chosenMember: JOIST_SPEC,
    resultSummary: summaryFor(j, JOIST_SPEC),
    sortOrder: 1,
  });
  if (options.unsized) {
    await Member.create({
      jobId: job.id,
      label: "B1 not sized",
      kind: "beam",
      flowState: defaultFlowState("beam"),
      chosenMember: null,
      resultSummary: null,
      sortOrder: 2,
    });
  }
  return { job, header, joist };
}

export function asSessionUser(u: { id: string; email: string; name: string; company: string | null; role: Role }) {
  return { id: u.id, email: u.email, name: u.name, company: u.company, role: u.role };
}
