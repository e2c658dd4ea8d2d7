/**
 * Who may call each route handler method and each server action. tests/api/access.test.ts finds every
 * `app/api/**\/route.ts` export (GET, POST, PUT, PATCH, DELETE) and every function exported from
 * `components/**\/actions.ts` and `app/**\/actions.ts`, and FAILS when one has no row here (or a row names
 * something that no longer exists). For each row it calls the handler directly as a signed-out visitor, a
 * builder, a subscriber and an admin (getSessionUser is mocked), and every caller not allowed must get
 * 401, 403 or 404 (an action: `{ ok: false, status: 401 | 403 | 404 }`, see lib/auth/action.ts, or a thrown
 * HttpError with that status).
 *
 * HOW TO ADD A ROW (one per method per route, one per action):
 *   { method: "POST", path: "/api/jobs", allowed: ["builder", "subscriber", "admin"] }
 *   { method: "GET", path: "/api/jobs/[jobId]", allowed: ["owner"], note: "404 for everyone else" }
 *   { method: "ACTION", path: "components/jobs/actions.ts#renameJob", allowed: ["owner"], args: [{ jobId: "…", name: "Deck" }] }
 *
 * - method: the HTTP method exported by the route file, or "ACTION" for a server action.
 * - path: the route's URL pattern as its folders spell it, without route groups: app/api/jobs/[jobId]/route.ts
 *   is "/api/jobs/[jobId]". An action is "<file>#<exportName>".
 * - allowed: who may use it.
 *     "public"      anyone, signed in or not (nothing is asserted beyond the row existing);
 *     "builder" | "subscriber" | "admin"   a signed-in account with that role (list each role allowed);
 *     "owner"       only the account that owns the thing named in the path (everyone else: 404 or 403);
 *     "crew"        anyone holding a valid crew link (a made-up link must get 404).
 *   Callers are checked as role personas; none of them owns anything, so a row with only "owner" (or "crew")
 *   expects all four callers to be refused.
 * - params: values for the path's [segments] (default: a random UUID each; [...rest] gets one).
 * - body: the JSON body sent to a route (default {}). Give a VALID body so that a missing session check shows
 *   up as a success or a 500, not as a 400 that happens to look like a refusal.
 * - args: the arguments passed to an action (default [{}]); valid ones, for the same reason.
 * - setup: optional async function run once before the row's calls (with TEST_DATABASE_URL set), returning
 *   params/body/args to use, e.g. a job created for some other account so "owner" is tested on a real row.
 * - note: why, in a few words, when it is not obvious.
 */

export type Allowed = "public" | "builder" | "subscriber" | "admin" | "owner" | "crew";
export type AccessMethod = "GET" | "POST" | "PUT" | "PATCH" | "DELETE" | "ACTION";

export interface AccessFixture {
  params?: Record<string, string | string[]>;
  body?: unknown;
  args?: unknown[];
}

export interface AccessRow extends AccessFixture {
  method: AccessMethod;
  path: string;
  allowed: Allowed[];
  note?: string;
  setup?: () => Promise<AccessFixture>;
}

const SIGNED_IN: Allowed[] = ["builder", "subscriber", "admin"];

/** The form a billing action receives from its button (payments rows). */
function checkoutForm(plan: string): FormData {
  const form = new FormData();
  form.set("plan", plan);
  return form;
}

export const ACCESS_TABLE: AccessRow[] = [
  // Health and the sizing engine: open to everyone, so a builder can size without an account.
  { method: "GET", path: "/api/health", allowed: ["public"] },
  { method: "POST", path: "/api/solve", allowed: ["public"] },
  { method: "POST", path: "/api/check", allowed: ["public"] },
  { method: "POST", path: "/api/size", allowed: ["public"] },
  { method: "GET", path: "/api/tables", allowed: ["public"], note: "the published tables a phone sizes with offline" },

  // Accounts (lib/auth): the public flows answer the same whatever the address; rate limits guard them.
  { method: "GET", path: "/api/auth/[...nextauth]", allowed: ["public"], note: "next-auth: csrf, session, providers" },
  { method: "POST", path: "/api/auth/[...nextauth]", allowed: ["public"], note: "next-auth: sign-in, sign-out" },
  { method: "POST", path: "/api/auth/sign-up", allowed: ["public"] },
  { method: "POST", path: "/api/auth/verify", allowed: ["public"], note: "needs the mailed single-use token" },
  { method: "POST", path: "/api/auth/verify/resend", allowed: ["public"] },
  { method: "POST", path: "/api/auth/password/forgot", allowed: ["public"] },
  { method: "POST", path: "/api/auth/password/reset", allowed: ["public"], note: "needs the mailed single-use token" },
  {
    method: "ACTION",
    path: "components/auth/actions.ts#updateProfile",
    allowed: SIGNED_IN,
    note: "changes only the caller's own account",
    args: [{ name: "Dee Rowe", company: "Hollis & Rowe Framing" }],
  },
  {
    method: "ACTION",
    path: "components/auth/actions.ts#changePassword",
    allowed: SIGNED_IN,
    note: "the caller's own password, given the current one",
    args: [{ currentPassword: "builder-demo-pass", newPassword: "a new long password" }],
  },
  {
    method: "ACTION",
    path: "components/admin/users/actions.ts#changeUserRole",
    allowed: ["admin"],
    args: [{ userId: "8f0c2a34-8d47-4c1e-9a55-3f6c1b2d4e5f", role: "admin" }],
  },

  // Material tables (issue 6): admins only. Bodies are valid so a missing role check would show.
  { method: "GET", path: "/api/admin/tables", allowed: ["admin"] },
  { method: "GET", path: "/api/admin/tables/[table]", allowed: ["admin"], params: { table: "steel-grades" } },
  {
    method: "POST",
    path: "/api/admin/tables/[table]/rows",
    allowed: ["admin"],
    params: { table: "steel-grades" },
    body: { baseVersionId: "3b2f7c1e-6a4d-4f0e-9c1b-2d3e4f5a6b7c", values: { name: "A572-50", Fy_ksi: "50", Fu_ksi: "65" } },
  },
  {
    method: "PUT",
    path: "/api/admin/tables/[table]/rows",
    allowed: ["admin"],
    params: { table: "steel-grades" },
    body: { baseVersionId: "3b2f7c1e-6a4d-4f0e-9c1b-2d3e4f5a6b7c", originalKey: "A36", values: { name: "A36", Fy_ksi: "36", Fu_ksi: "58" } },
  },
  {
    method: "DELETE",
    path: "/api/admin/tables/[table]/rows",
    allowed: ["admin"],
    params: { table: "steel-grades" },
    body: { baseVersionId: "3b2f7c1e-6a4d-4f0e-9c1b-2d3e4f5a6b7c", key: "A36" },
  },
  { method: "GET", path: "/api/admin/tables/[table]/csv", allowed: ["admin"], params: { table: "steel-grades" } },
  { method: "POST", path: "/api/admin/tables/[table]/import/preview", allowed: ["admin"], params: { table: "steel-grades" }, note: "multipart CSV upload" },
  { method: "POST", path: "/api/admin/tables/[table]/import", allowed: ["admin"], params: { table: "steel-grades" }, note: "multipart CSV upload" },
  { method: "GET", path: "/api/admin/tables/versions", allowed: ["admin"] },
  { method: "GET", path: "/api/admin/tables/versions/[versionId]", allowed: ["admin"] },
  { method: "POST", path: "/api/admin/tables/versions/[versionId]/restore", allowed: ["admin"], body: { note: "Back to the seeded values" } },

  // Payments: Stripe signs its events; there is no session to check.
  { method: "POST", path: "/api/stripe/webhook", allowed: ["public"], note: "the Stripe signature on the raw body is the check" },
  {
    method: "ACTION",
    path: "components/billing/actions.ts#startCheckoutAction",
    allowed: ["builder", "subscriber"],
    note: "admins already have every paid feature",
    args: [null, checkoutForm("monthly")],
  },
  {
    method: "ACTION",
    path: "components/billing/actions.ts#openPortalAction",
    allowed: SIGNED_IN,
    note: "opens the caller's own customer only",
    args: [null, checkoutForm("monthly")],
  },

  // Crew links and job sheets: everything belongs to the job's owner (a stranger's real job, link and sheet
  // here, so "owner" is tested on real rows). The crew page (/crew/[token]) is a page, not a route: the only
  // thing a token opens is that read-only page, and no route or action below accepts a token in its place
  // (tests/crew/crew-access.test.ts checks both).
  {
    method: "ACTION",
    path: "components/crew/actions.ts#createCrewLink",
    allowed: ["owner"],
    note: "404 for a job of someone else",
    setup: crewFixture("create"),
  },
  {
    method: "ACTION",
    path: "components/crew/actions.ts#revokeCrewLink",
    allowed: ["owner"],
    note: "404 for a link of someone else",
    setup: crewFixture("link"),
  },
  { method: "ACTION", path: "components/crew/actions.ts#sendCrewLink", allowed: ["owner"], note: "404 for a link of someone else", setup: crewFixture("send") },
  {
    method: "ACTION",
    path: "components/sheets/actions.ts#saveJobSheet",
    allowed: ["owner"],
    note: "a free builder gets 403 (subscription), anyone else's job 404",
    setup: crewFixture("create"),
  },
  {
    method: "GET",
    path: "/api/sheets/[id]/pdf",
    allowed: ["owner"],
    note: "404 for anyone else's sheet; 403 for the owner without a subscription",
    setup: crewFixture("sheet"),
  },

  // Order lists and the site-board PDF: the order belongs to the job's owner; the crew PDF opens with a live crew link only.
  {
    method: "ACTION",
    path: "components/orders/actions.ts#emailOrderList",
    allowed: ["owner"],
    note: "404 for a job of someone else",
    setup: orderFixture("mail"),
  },
  { method: "GET", path: "/api/jobs/[jobId]/order", allowed: ["owner"], note: "404 for a job of someone else", setup: orderFixture("route") },
  {
    method: "GET",
    path: "/api/crew/[token]/pdf",
    allowed: ["crew"],
    note: "a made-up token is a 404; no session needed or used",
    params: { token: "made-up-token-AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA" },
  },

  // Jobs and members (components/jobs/actions.ts): any signed-in account makes its own; everything else belongs
  // to the job's owner and is a 404 for anyone else, whatever the role (a stranger's real job and member here).
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#createJob",
    allowed: SIGNED_IN,
    note: "makes a job of the caller's own",
    args: [{ name: "Orchard Row deck", siteAddress: "7 Orchard Row, Larkfield" }],
  },
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#saveMember",
    allowed: SIGNED_IN,
    note: "to a new job of the caller's own here; another's job is 404 (tests/jobs)",
    setup: jobsFixture("save"),
  },
  {
    method: "POST",
    path: "/api/members",
    allowed: SIGNED_IN,
    note: "a queued save, once per Idempotency-Key, to the caller's own job (tests/jobs/save-once)",
    setup: async () => ({ body: (await jobsFixture("save")()).args?.[0] }),
  },
  {
    method: "PATCH",
    path: "/api/members/[memberId]",
    allowed: ["owner"],
    note: "a change queued on a phone, once per Idempotency-Key, 409 if the member changed since; 404 for a member of someone else's job (tests/jobs/edit-once)",
    setup: async () => {
      const { defaultFlowState } = await import("@/lib/flow/defaults");
      const fixture = await jobsFixture("update-member")();
      const memberId = (fixture.args?.[0] as { memberId?: string } | undefined)?.memberId;
      const body = { baseVersion: "0".repeat(64), label: "Taken over", flowState: defaultFlowState("header"), chosenMember: null };
      return memberId ? { params: { memberId }, body } : { body };
    },
  },
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#updateJob",
    allowed: ["owner"],
    note: "404 for a job of someone else",
    setup: jobsFixture("update-job"),
  },
  { method: "ACTION", path: "components/jobs/actions.ts#deleteJob", allowed: ["owner"], note: "404 for a job of someone else", setup: jobsFixture("job") },
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#restoreJob",
    allowed: ["owner"],
    note: "404 for someone else's deleted job",
    setup: jobsFixture("deleted-job"),
  },
  { method: "ACTION", path: "components/jobs/actions.ts#duplicateJob", allowed: ["owner"], note: "404 for a job of someone else", setup: jobsFixture("job") },
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#updateMember",
    allowed: ["owner"],
    note: "404 for a member of someone else's job",
    setup: jobsFixture("update-member"),
  },
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#deleteMember",
    allowed: ["owner"],
    note: "404 for a member of someone else's job",
    setup: jobsFixture("member"),
  },
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#restoreMember",
    allowed: ["owner"],
    note: "404 for someone else's deleted member",
    setup: jobsFixture("deleted-member"),
  },
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#duplicateMember",
    allowed: ["owner"],
    note: "404 for a member of someone else's job",
    setup: jobsFixture("member"),
  },
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#addSupport",
    allowed: ["owner"],
    note: "404 for a job of someone else",
    setup: jobsFixture("add-support"),
  },
  {
    method: "ACTION",
    path: "components/jobs/actions.ts#markChangesSeen",
    allowed: ["owner"],
    note: "404 for a job of someone else",
    setup: jobsFixture("job"),
  },
];

/** A job owned by an account none of the personas is, and valid arguments for its order list. */
function orderFixture(kind: "mail" | "route"): () => Promise<AccessFixture> {
  return async () => {
    if (!process.env.TEST_DATABASE_URL) return {};
    const { makeAccount, makeJob } = await import("../crew/fixtures");
    const owner = await makeAccount("subscriber", "access-order");
    const { job } = await makeJob(owner.id);
    if (kind === "route") return { params: { jobId: job.id } };
    return { args: [{ jobId: job.id, to: "orders@yard.example", note: "" }] };
  };
}

/** A job with a member, owned by an account none of the personas is, and valid arguments naming them. */
function jobsFixture(
  kind: "save" | "job" | "update-job" | "deleted-job" | "member" | "update-member" | "deleted-member" | "add-support",
): () => Promise<AccessFixture> {
  return async () => {
    const { defaultFlowState } = await import("@/lib/flow/defaults");
    const flowState = defaultFlowState("floor-joist");
    if (kind === "save") return { args: [{ newJob: { name: "Orchard Row deck" }, label: "J1 deck joists", flowState, chosenMember: null }] };
    if (!process.env.TEST_DATABASE_URL) return {};
    const { makeAccount, makeJob } = await import("../crew/fixtures");
    const owner = await makeAccount("subscriber", "access-jobs");
    const { job, header } = await makeJob(owner.id);
    if (kind === "deleted-job") await job.update({ deletedAt: new Date() });
    if (kind === "deleted-member") await header.update({ deletedAt: new Date() });
    if (kind === "job" || kind === "deleted-job") return { args: [{ jobId: job.id }] };
    if (kind === "update-job") return { args: [{ jobId: job.id, name: "Taken over", siteAddress: "", notes: "" }] };
    if (kind === "update-member") return { args: [{ memberId: header.id, label: "Taken over" }] };
    if (kind === "add-support") {
      const post = { type: "post", size: "4x4", plies: 1, species: "Douglas Fir-Larch", grade: "No.2", heightFt: 8, wet: false };
      return { args: [{ jobId: job.id, underMemberId: header.id, label: "P1 posts", design: post }] };
    }
    return { args: [{ memberId: header.id }] };
  };
}

/** A job, live crew link and job sheet owned by an account none of the personas is, and the arguments naming them. */
function crewFixture(kind: "create" | "link" | "send" | "sheet"): () => Promise<AccessFixture> {
  return async () => {
    if (!process.env.TEST_DATABASE_URL) return {};
    const { makeAccount, makeJob, asSessionUser } = await import("../crew/fixtures");
    const { createCrewLink } = await import("@/lib/crew/links");
    const { saveJobSheet } = await import("@/lib/sheets/sheets");
    const owner = await makeAccount("subscriber", "access-owner");
    const { job } = await makeJob(owner.id);
    if (kind === "create") return { args: [{ jobId: job.id, label: "Crew", expiresInDays: 0 }] };
    if (kind === "sheet") return { params: { id: (await saveJobSheet(asSessionUser(owner), job.id)).id } };
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: null });
    return { args: [kind === "link" ? { linkId: link.id } : { linkId: link.id, to: "crew@example.test", note: "" }] };
  };
}
