import { describe, expect, test } from "vitest";
import { asdCombinations } from "@/lib/solver/asce7/combinations";
import { renderSheetPdf } from "@/lib/sheets/pdf";
import { buildSheetSnapshot, sheetSources, type SheetSnapshot } from "@/lib/sheets/snapshot";
import { valueIn } from "@/lib/diagrams/geometry";
import { STARTER_TABLES } from "@/lib/tables";
import { defaultFlowState } from "@/lib/flow/defaults";
import { sizeRequest } from "@/lib/flow/request";
import { sizeMember } from "@/lib/solver/design";
import type { MaterialTables } from "@/lib/tables/types";
import { HEADER_SPEC, JOIST_SPEC, headerState, joistState } from "../crew/fixtures";
import { hasPdftotext, isPdf, pdfStreamText, pdftotext } from "./pdf-text";

const NOW = new Date("2026-12-01T15:00:00Z");

function snapshotWith(tables: MaterialTables, header = headerState()): SheetSnapshot {
  return buildSheetSnapshot({
    job: { id: "job-1", name: "Marsh Lane addition", siteAddress: "14 Marsh Lane, Larkfield", notes: "" },
    preparedBy: { name: "Sam Hollis", company: "Hollis & Rowe Framing" },
    members: [
      { id: "m1", label: "H1 kitchen header", kind: "header", flowState: header, chosenMember: HEADER_SPEC, savedTables: null },
      { id: "m2", label: "J1 family room joists", kind: "floor-joist", flowState: joistState(), chosenMember: JOIST_SPEC, savedTables: null },
      { id: "m3", label: "B1 not sized", kind: "beam", flowState: joistState(), chosenMember: null, savedTables: null },
    ],
    tables,
    now: NOW,
  });
}

/** The starter tables with Douglas Fir-Larch No.2's Fb and E lowered and a new version name: an admin's edit. */
function editedTables(): MaterialTables {
  const copy = structuredClone(STARTER_TABLES) as MaterialTables;
  copy.version = "edited-2026.2";
  for (const v of copy.sawnValues) {
    if (v.species === "Douglas Fir-Larch" && v.grade === "No.2") {
      v.Fb = Math.round(v.Fb * 0.6);
      v.E = Math.round(v.E * 0.7);
    }
  }
  return copy;
}

// ASCE 7-22 §2.4.1 combinations by the name the sheet prints
const factorsOf = (name: string) => asdCombinations().find((c) => c.name === name)!.factors;

describe("a sheet's snapshot", () => {
  const snap = snapshotWith(STARTER_TABLES);
  const header = snap.members[0];

  test("holds the job, who prepared it, the date, the tables version, the caution and every sized member", () => {
    expect(snap.job.name).toBe("Marsh Lane addition");
    expect(snap.preparedBy.company).toBe("Hollis & Rowe Framing");
    expect(snap.savedAt).toBe(NOW.toISOString());
    expect(snap.tablesVersion).toBe(STARTER_TABLES.version);
    expect(snap.caution.text).toMatch(/^Preliminary sizing for typical house framing/);
    expect(snap.caution.notChecked.length).toBeGreaterThan(3);
    expect(snap.members.map((m) => m.label)).toEqual(["H1 kitchen header", "J1 family room joists"]);
    expect(snap.skipped).toEqual([{ id: "m3", label: "B1 not sized", reason: "no size chosen yet" }]);
    expect(header.headline).toMatch(/^3-ply 2x12 No\.2 — \d jack studs? each end$/);
    expect(header.checks.map((c) => c.name)).toEqual(expect.arrayContaining(["bending", "shear", "deflection-live", "deflection-total", "bearing"]));
    expect(header.reactions).toHaveLength(2);
    expect(header.diagrams.map((d) => d.quantity)).toEqual(["V", "M", "deflection"]);
  });

  test("survives a trip through JSON (it is stored as JSONB) unchanged", () => {
    expect(JSON.parse(JSON.stringify(snap))).toEqual(snap);
  });

  // Simply supported beam, uniform load over the whole span (AISC Steel Construction Manual 15th ed.,
  // Table 3-23 case 1): Mmax = wL²/8 at midspan, Vmax = R = wL/2, Δmax = 5wL⁴/(384EI).
  test("the frozen diagrams agree with the textbook simple-span formulas", () => {
    const L = header.lengthFt;
    const moment = header.diagrams.find((d) => d.quantity === "M")!;
    const factors = factorsOf(moment.combination);
    // every load on this header is a full-length line load (area loads × tributary width, own weight)
    const w = header.loads.reduce((sum, l) => sum + (l.w ?? 0) * (factors[l.case as keyof typeof factors] ?? 0), 0);
    const Mmax = (w * L * L) / 8;
    // tolerance 1e-4 relative: the line loads listed on the sheet (and summed here) are rounded to 0.01 plf
    expect(Math.abs(moment.extremes[0].value - Mmax) / Mmax).toBeLessThan(1e-4);
    expect(moment.extremes[0].x).toBeCloseTo(L / 2, 6);
    const seg = moment.segments.find((s) => s.x0 <= L / 2 && s.x1 >= L / 2)!;
    expect(Math.abs(valueIn(seg, "M", L / 2) - Mmax) / Mmax).toBeLessThan(1e-4);

    const shear = header.diagrams.find((d) => d.quantity === "V")!;
    expect(Math.abs(Math.abs(shear.extremes[0].value) - (w * L) / 2) / ((w * L) / 2)).toBeLessThan(1e-4);

    // bending stress fb = M/S with S = n·b·d²/6 of three dressed 2x12 plies (1.5 in × 11.25 in, NDS Supplement 2018 Table 1B)
    const S = (3 * 1.5 * 11.25 ** 2) / 6;
    const bending = header.checks.find((c) => c.name === "bending")!;
    expect(bending.combination).toBe(moment.combination);
    expect(Math.abs(bending.demand - (Mmax * 12) / S) / bending.demand).toBeLessThan(0.005);

    // deflection with E = 1,600,000 psi (Douglas Fir-Larch No.2, NDS Supplement 2018 Table 4A) and I = n·b·d³/12
    const deflection = header.diagrams.find((d) => d.quantity === "deflection")!;
    const df = factorsOf(deflection.combination);
    const wd = header.loads.reduce((sum, l) => sum + (l.w ?? 0) * (df[l.case as keyof typeof df] ?? 0), 0);
    const I = (3 * 1.5 * 11.25 ** 3) / 12;
    const delta = (5 * (wd / 12) * (L * 12) ** 4) / (384 * 1_600_000 * I);
    expect(Math.abs(deflection.extremes[0].value - delta) / delta).toBeLessThan(0.005);
  });

  test("changing the tables changes a new sheet but not the one already made", async () => {
    const before = JSON.stringify(snap);
    const pdfBefore = pdfStreamText(await renderSheetPdf(snap));
    const fresh = snapshotWith(editedTables());
    expect(fresh.tablesVersion).toBe("edited-2026.2");
    expect(fresh.members[0].ratio).toBeGreaterThan(header.ratio);
    expect(JSON.stringify(snap)).toBe(before);
    const pdfAfter = pdfStreamText(await renderSheetPdf(snap));
    expect(pdfAfter).toBe(pdfBefore);
    expect(pdfAfter).toContain(`tables ${STARTER_TABLES.version}`);
    expect(pdfAfter).not.toContain("edited-2026.2");
  });

  test("a member whose answer changed since it was saved says so on the sheet; an unchanged one says nothing", () => {
    const same = { headline: header.headline, ratio: header.ratio };
    const build = (savedAnswer: { headline: string; ratio: number }) =>
      buildSheetSnapshot({
        job: snap.job,
        preparedBy: snap.preparedBy,
        members: [{ id: "m1", label: "H1", kind: "header", flowState: headerState(), chosenMember: HEADER_SPEC, savedTables: "older-tables", savedAnswer }],
        tables: STARTER_TABLES,
        now: NOW,
      }).members[0].note;
    expect(build(same)).toBeNull();
    const note = build({ headline: "3-ply 2x12 No.2 — 3 jack studs each end", ratio: 0.5 });
    expect(note).toContain('it read "3-ply 2x12 No.2 — 3 jack studs each end" at 50%');
    expect(note).toContain("older-tables");
  });

  test("a member whose inputs no longer check is listed as left out, with the reason", () => {
    const broken = { ...headerState(), supports: [{ x: 0, type: "pin" as const }] };
    const s = snapshotWith(STARTER_TABLES, broken);
    expect(s.members.map((m) => m.label)).toEqual(["J1 family room joists"]);
    expect(s.skipped.find((k) => k.id === "m1")?.reason).toBeTruthy();
  });
});

describe("the sheet's PDF", () => {
  test("is a valid PDF naming the job, the members, the tables version, the company and the caution", async () => {
    const snap = snapshotWith(STARTER_TABLES);
    for (const paper of ["letter", "a4"] as const) {
      const pdf = await renderSheetPdf(snap, paper);
      expect(isPdf(pdf)).toBe(true);
      const text = pdfStreamText(pdf);
      for (const words of [
        "Marsh Lane addition",
        "H1 kitchen header",
        "J1 family room joists",
        "3-ply 2x12 No.2",
        "Hollis & Rowe Framing",
        STARTER_TABLES.version,
        "Check before you build",
        "B1 not sized",
      ]) {
        expect(text, words).toContain(words);
      }
      expect(text).toContain("Preliminary sizing for typical house framing.");
      expect(pdf.toString("latin1")).toContain(paper === "a4" ? "/MediaBox [0 0 595.28 841.89]" : "/MediaBox [0 0 612 792]");
    }
  });

  test.skipIf(!hasPdftotext())("an outside reader (poppler's pdftotext) finds the same words", async () => {
    const text = pdftotext(await renderSheetPdf(snapshotWith(STARTER_TABLES)));
    for (const words of [
      "Marsh Lane addition",
      "H1 kitchen header",
      "J1 family room joists",
      "Hollis & Rowe Framing",
      "Spanlark does not check",
      "Reactions and bearing",
    ]) {
      expect(text, words).toContain(words);
    }
    expect(text).toMatch(/Page 1 of \d+/);
  });

  test("draws the diagrams as vector curves, not pictures", async () => {
    const pdf = await renderSheetPdf(snapshotWith(STARTER_TABLES));
    const raw = pdf.toString("latin1");
    expect(raw).not.toContain("/Subtype /Image");
    // inflate the content streams and count cubic Bézier operators ("c")
    const { inflateSync } = await import("node:zlib");
    let curves = 0;
    for (const m of raw.matchAll(/\/Filter \/FlateDecode[^]*?stream\r?\n/g)) {
      const start = m.index! + m[0].length;
      const content = inflateSync(pdf.subarray(start, raw.indexOf("endstream", start))).toString("latin1");
      curves += (content.match(/ c\n/g) ?? []).length;
    }
    expect(curves).toBeGreaterThan(20);
  });
});

describe("a roof member on the sheet", () => {
  const rafter = defaultFlowState("rafter");
  const snow = { ...rafter, snow: { ...rafter.snow, on: true, groundPsf: 30, exposure: "partially-exposed" as const, thermal: "cold-ventilated" as const } };
  const size = sizeMember(sizeRequest(snow), STARTER_TABLES);
  const snap = buildSheetSnapshot({
    job: { id: "job-2", name: "Fern Row porch", siteAddress: "", notes: "" },
    preparedBy: { name: "Sam Hollis", company: null },
    members: [{ id: "r1", label: "R1 porch rafters", kind: "rafter", flowState: snow, chosenMember: size.passing[0].member, savedTables: null }],
    tables: STARTER_TABLES,
    now: NOW,
  });
  const m = snap.members[0];

  test("its deflection note names the roof row of IRC 2021 Table R301.7, not floors", () => {
    expect(m.limits.source).toMatch(/^Roofs and ceilings/);
    expect(m.limits.source).not.toMatch(/floor/i);
  });

  test("the snow inputs are in words, with no internal codes", () => {
    const snowRow = m.inputs.find(([k]) => k === "Snow (S)")![1];
    expect(snowRow).toBe("ground snow 30 psf; roof partially exposed (Ce 1); building cold, ventilated (Ct 1.1)");
    expect(m.inputs.map(([, v]) => v).join(" ")).not.toMatch(/[a-z]+-[a-z]+ed\b/);
  });

  test("the answer line is the sizing search's, word for word, with the bearing on the plate", () => {
    expect(m.headline).toBe(size.passing[0].answer);
    expect(m.headline).toMatch(/ at \d+ in o\.c\. — .* bearing each end on the plate, beam or hanger$/);
  });
});

describe("the sheet's appendix of sources", () => {
  test("lists each source behind its members once, with no from-memory flag when every value was checked", () => {
    const snap = snapshotWith(STARTER_TABLES);
    const sources = sheetSources(snap);
    expect(sources.length).toBeGreaterThan(0);
    expect(new Set(sources.map((s) => s.source)).size).toBe(sources.length);
    for (const m of snap.members) for (const s of m.sources ?? []) expect(sources.map((x) => x.source)).toContain(s);
    // the header and joists are Douglas Fir-Larch dimension lumber: Table 4A, checked
    expect(sources.some((s) => s.source.startsWith("NDS Supplement 2018, Table 4A;"))).toBe(true);
  });

  test("flags a member whose values are from memory, on the page and in the PDF", async () => {
    const tables = structuredClone(STARTER_TABLES) as MaterialTables;
    for (const v of tables.sawnValues) v.source = `${v.source.split(";")[0]}; from memory — verify against the printed table`;
    const snap = snapshotWith(tables);
    const flagged = sheetSources(snap).filter((s) => s.fromMemory);
    expect(flagged.length).toBeGreaterThan(0);
    const text = pdfStreamText(await renderSheetPdf(snap));
    expect(text).toContain("Appendix: where the design values come from");
    expect(text).toContain("FROM MEMORY");
  });

  test("an older sheet without sources still prints", async () => {
    const snap = snapshotWith(STARTER_TABLES);
    const old = { ...snap, members: snap.members.map(({ sources: _s, ...m }) => m) };
    expect(sheetSources(old)).toEqual([]);
    expect(isPdf(await renderSheetPdf(old))).toBe(true);
  });
});
