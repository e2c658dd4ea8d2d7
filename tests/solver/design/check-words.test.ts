import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, test } from "vitest";
import { CHECK_WORDS, checkTitle, checkWords } from "@/lib/solver/design/check-words";
import { CHECK_NAMES } from "@/lib/solver/design/types";
import { verdictWords } from "@/lib/solver/design/check";

// The words for each check live in one place (lib/solver/design/check-words.ts); the answer's verdict,
// the ratio bars, the crew link and the sheets read them from there.
describe("check names have their words", () => {
  test.each(CHECK_NAMES.map((n) => [n]))("%s has words for a sentence and a heading", (name) => {
    const w = CHECK_WORDS[name];
    expect(w.words.trim().length).toBeGreaterThan(0);
    expect(w.title.charAt(0)).toBe(w.title.charAt(0).toUpperCase());
    expect(checkWords(name)).toBe(w.words);
    expect(checkTitle(name)).toBe(w.title);
    expect(verdictWords({ pass: false, ratio: 1.2, governing: name })).toBe(`Over 120% (${w.words})`);
  });

  test("no word map for a name that is not a check, and none missing", () => {
    expect(Object.keys(CHECK_WORDS).sort()).toEqual([...CHECK_NAMES].sort());
  });

  test("a name from a newer version still reads, and none reads as a dash", () => {
    expect(checkWords("lateral-torsional-buckling")).toBe("lateral torsional buckling");
    expect(checkTitle("lateral-torsional-buckling")).toBe("Lateral torsional buckling");
    expect(checkWords(null)).toBe("—");
  });

  test("the screens, the crew link and the sheets keep no map of their own", () => {
    for (const file of ["components/flow/words.ts", "lib/sheets/format.ts", "lib/solver/design/check.ts", "lib/crew/schedule.ts", "lib/sheets/pdf.ts"]) {
      const text = readFileSync(join(process.cwd(), file), "utf8");
      expect(text, file).not.toMatch(/"web-crippling"\s*:/);
      expect(text, file).not.toMatch(/"deflection-live"\s*:/);
    }
  });
});
