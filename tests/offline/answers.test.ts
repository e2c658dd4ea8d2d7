// The server's recheck of an answer worked out on a phone with no signal (lib/offline/answers.ts), with the
// sizing the phone and the server both run (sizeMember) on the tables that ship with the app and on a later
// version of them; and which pages the service worker keeps (lib/offline/pages.ts). No database.
import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import { sizeRequest } from "@/lib/flow/request";
import { withMainSpan } from "@/lib/flow/state";
import { answerLineOf, recheck, shownCandidate, tablesWords, type TablesStamp } from "@/lib/offline/answers";
import { crewPdfPath, isCrewPdfPath, isPrivatePath, pageCacheKey, shouldCachePage } from "@/lib/offline/pages";
import { sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";
import type { MaterialTables } from "@/lib/tables/types";

const V6: TablesStamp = { id: "6b0c7f9e-0000-4000-8000-000000000006", number: 6, publishedAt: "2026-12-02T15:04:00.000Z" };
const V7: TablesStamp = { id: "6b0c7f9e-0000-4000-8000-000000000007", number: 7, publishedAt: "2026-12-03T08:30:00.000Z" };

// an 8 ft header in a 2x6 wall, built up of sawn lumber (the header's default): several members pass in the starter tables
const headerState = defaultFlowState("header");
const header8 = sizeRequest(withMainSpan({ ...headerState, wallFraming: "2x6" }, 8));

describe("tablesWords", () => {
  test.each([
    ["a published version", V6, "tables v6 of 2 Dec"],
    ["late in the day UTC stays that day", { ...V6, publishedAt: "2026-12-02T23:59:00.000Z" }, "tables v6 of 2 Dec"],
    ["the starter tables", { id: STARTER_TABLES.version, number: null, publishedAt: null }, "the starter tables"],
  ])("%s", (_label, stamp, words) => {
    expect(tablesWords(stamp)).toBe(words);
  });
});

describe("recheck of a phone's answer by the server", () => {
  test("same tables, same inputs: the same answer (the phone ran the server's sizeMember)", () => {
    const phone = sizeMember(header8, STARTER_TABLES);
    const server = sizeMember(JSON.parse(JSON.stringify(header8)), STARTER_TABLES);
    const r = recheck({ answer: answerLineOf(shownCandidate(phone, null)), tables: V6 }, { answer: answerLineOf(shownCandidate(server, null)), tables: V6 });
    expect(r.same).toBe(true);
    expect(r.phone?.headline).toMatch(/jack stud/);
  });

  test("the tables changed (the phone's member was taken out of them): the server's member, and why, naming both versions", () => {
    const phone = sizeMember(header8, STARTER_TABLES);
    const phoneLine = answerLineOf(shownCandidate(phone, null));
    if (!phoneLine || phoneLine.spec.material !== "sawn") throw new Error("expected a sawn header on the phone");
    const size = phoneLine.spec.size;
    const later: MaterialTables = { ...STARTER_TABLES, version: V7.id, sawnSizes: STARTER_TABLES.sawnSizes.filter((s) => s.name !== size) };
    const server = sizeMember(header8, later);
    const serverLine = answerLineOf(shownCandidate(server, phoneLine.spec));
    expect(serverLine).not.toBeNull();
    expect(serverLine?.memberLabel).not.toBe(phoneLine.memberLabel);
    const r = recheck({ answer: phoneLine, tables: V6 }, { answer: serverLine, tables: V7 });
    expect(r.same).toBe(false);
    if (r.same) return;
    expect(r.phone?.headline).toBe(phoneLine.headline);
    expect(r.server?.headline).toBe(serverLine?.headline);
    expect(r.why).toBe("The material tables were updated: this phone used tables v6 of 2 Dec, the server used tables v7 of 3 Dec.");
  });

  test("the chosen member still passes on the server: it stays the answer", () => {
    const phone = sizeMember(header8, STARTER_TABLES);
    const second = phone.passing[1];
    expect(second).toBeDefined();
    expect(shownCandidate(phone, second.member)?.label).toBe(second.label);
    // a member that is not among those passing falls back to the best
    expect(shownCandidate(phone, { material: "steel", shape: "W99x999", grade: "A992" })?.label).toBe(phone.passing[0].label);
  });

  test("same tables, another percentage of capacity: changed, and the reason says the phone's copy of the app is older", () => {
    const line = answerLineOf(shownCandidate(sizeMember(header8, STARTER_TABLES), null));
    if (!line) throw new Error("expected an answer");
    const r = recheck({ answer: line, tables: V7 }, { answer: { ...line, ratio: line.ratio + 0.05 }, tables: V7 });
    expect(r.same).toBe(false);
    if (!r.same) expect(r.why).toMatch(/tables are the same \(tables v7 of 3 Dec\); this phone's copy of Spanlark is older/);
    // nothing passing on both sides is the same answer
    expect(recheck({ answer: null, tables: V7 }, { answer: null, tables: V7 }).same).toBe(true);
  });
});

describe("pages the service worker keeps", () => {
  test.each([
    ["the bare sizing flow", "https://spanlark.test/size", true, "https://spanlark.test/size"],
    ["the flow with a state in its address: found as /size, not stored", "https://spanlark.test/size?s=abc&step=answer", false, "https://spanlark.test/size"],
    [
      "a saved member reopened to change it: its own page",
      "https://spanlark.test/size?job=0b7f1c2e-8a4d-4c1e-9f3a-2d5e6f7a8b9c&member=1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f",
      true,
      "https://spanlark.test/size?job=0b7f1c2e-8a4d-4c1e-9f3a-2d5e6f7a8b9c&member=1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f",
    ],
    [
      "a saved member with a state in its address: found by job and member, not stored",
      "https://spanlark.test/size?job=0b7f1c2e-8a4d-4c1e-9f3a-2d5e6f7a8b9c&member=1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f&s=abc",
      false,
      "https://spanlark.test/size?job=0b7f1c2e-8a4d-4c1e-9f3a-2d5e6f7a8b9c&member=1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f",
    ],
    ["a crew link", "https://spanlark.test/crew/AbC_dEf", true, "https://spanlark.test/crew/AbC_dEf"],
    ["an admin page", "https://spanlark.test/admin/tables", false, "https://spanlark.test/admin/tables"],
    ["a password reset with its token", "https://spanlark.test/reset-password?token=x", false, "https://spanlark.test/reset-password?token=x"],
  ])("%s", (_label, url, stored, key) => {
    expect(shouldCachePage(url)).toBe(stored);
    expect(pageCacheKey(url)).toBe(key);
  });

  test("a crew link's site-board PDF is kept beside its page", () => {
    expect(crewPdfPath("/crew/AbC_dEf")).toBe("/api/crew/AbC_dEf/pdf");
    expect(crewPdfPath("/crew/AbC_dEf/more")).toBeNull();
    expect(crewPdfPath("/jobs/x")).toBeNull();
    expect(isCrewPdfPath("/api/crew/AbC_dEf/pdf")).toBe(true);
    expect(isCrewPdfPath("/api/crew/AbC_dEf")).toBe(false);
  });

  test("private paths", () => {
    expect(isPrivatePath("/admin")).toBe(true);
    expect(isPrivatePath("/administer")).toBe(false);
    expect(isPrivatePath("/verify")).toBe(true);
  });
});
