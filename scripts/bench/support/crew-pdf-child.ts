// The measurements of scripts/bench/crew-pdf.ts (run in a child process with --conditions=react-server).
import { defaultFlowState } from "../../../lib/flow/defaults";
import { checkRequest, sizeRequest } from "../../../lib/flow/request";
import { summarize } from "../../../lib/flow/summary";
import { withMainSpan, type FlowState } from "../../../lib/flow/state";
import type { CrewJobView } from "../../../lib/crew/links";
import { crewPdf, crewPdfCounts, crewPdfVersion, etagMatches, resetCrewPdfCache } from "../../../lib/crew/pdf-cache";
import { renderCrewPdf } from "../../../lib/crew/pdf";
import { crewQrPng } from "../../../lib/crew/qr";
import { scheduleRow } from "../../../lib/crew/schedule";
import { NOT_CHECKED } from "../../../lib/caution";
import { checkMember, sizeMember } from "../../../lib/solver/design";
import { STARTER_TABLES } from "../../../lib/tables";
import { median, timed } from "./stats";

const CREW = 10;
const ROUNDS = Number(process.env.BENCH_CREW_PDF_ROUNDS ?? "3");

// An invented job: a header, a beam, floor joists and deck joists, each sized on the starter tables.
function sized(id: string, label: string, state: FlowState) {
  const spec = sizeMember(sizeRequest(state), STARTER_TABLES).passing[0]?.member;
  if (!spec) throw new Error(`${label}: nothing passes`);
  return scheduleRow({ id, label, kind: state.kind, resultSummary: summarize(state, checkMember(checkRequest(state, spec), STARTER_TABLES)) });
}

const view: CrewJobView = {
  job: { name: "Kestrel Lane addition", siteAddress: "9 Kestrel Lane", notes: "Deck first; the kitchen opening after the beam is in." },
  rows: [
    sized("h1", "H1 kitchen header", withMainSpan(defaultFlowState("header"), 8)),
    sized("b1", "B1 family room beam", withMainSpan(defaultFlowState("beam"), 14)),
    sized("j1", "J1 floor joists", withMainSpan(defaultFlowState("floor-joist"), 13.5)),
    sized("d1", "DJ1 deck joists", withMainSpan(defaultFlowState("deck-joist"), 11)),
  ],
  expiresAt: null,
  notChecked: [...NOT_CHECKED],
  changedAt: new Date().toISOString(),
  readAt: new Date().toISOString(),
};
const url = "http://127.0.0.1:3100/crew/AAAAAAAAAAAAAAAAAAAAAAAA";

// warm-up: fonts, pdfkit and the QR encoder loaded once
await renderCrewPdf(view, { url, qrPng: await crewQrPng(url, 400) }, "letter");

const rows: { label: string; ms: number; renders: number }[] = [];
const uncached: number[] = [];
const cachedCold: number[] = [];
const revalidated: number[] = [];
let cachedRenders = 0;
let revalidatedRenders = 0;
for (let round = 0; round < ROUNDS; round++) {
  uncached.push(
    await timed(async () => {
      for (let i = 0; i < CREW; i++) await renderCrewPdf(view, { url, qrPng: await crewQrPng(url, 400) }, "letter", new Date());
    }),
  );
  resetCrewPdfCache();
  cachedCold.push(
    await timed(async () => {
      for (let i = 0; i < CREW; i++) await crewPdf(view, url, "letter", new Date());
    }),
  );
  cachedRenders = crewPdfCounts().renders;
  const etag = `"${crewPdfVersion(view, url, "letter", new Date())}"`;
  resetCrewPdfCache();
  revalidated.push(
    await timed(async () => {
      for (let i = 0; i < CREW; i++) {
        const version = crewPdfVersion(view, url, "letter", new Date());
        if (!etagMatches(etag, `"${version}"`)) await crewPdf(view, url, "letter", new Date(), version);
      }
    }),
  );
  revalidatedRenders = crewPdfCounts().renders;
}
rows.push({ label: "before: every open draws the sheet (the route uncached)", ms: median(uncached), renders: CREW });
rows.push({ label: "after: ten phones without a copy (one drawing, nine from the cache)", ms: median(cachedCold), renders: cachedRenders });
rows.push({ label: "after: ten phones holding the current copy (If-None-Match → 304)", ms: median(revalidated), renders: revalidatedRenders });

const bytes = (await crewPdf(view, url, "letter", new Date())).length;
console.log(
  `\nCrew sheet PDF, ${CREW} opens of one unchanged schedule (${view.rows.length} members, ${Math.round(bytes / 1024)} kB sheet), median of ${ROUNDS} rounds`,
);
console.log("| case | server time for 10 opens | per open | sheets drawn |");
console.log("|---|---|---|---|");
for (const r of rows) console.log(`| ${r.label} | ${r.ms.toFixed(1)} ms | ${(r.ms / CREW).toFixed(2)} ms | ${r.renders} |`);
console.log(`before / after (ten phones without a copy): ×${(rows[0].ms / rows[1].ms).toFixed(1)}`);
