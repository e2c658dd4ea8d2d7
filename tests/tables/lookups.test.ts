import { describe, expect, test } from "vitest";
import {
  checkEngineeredSize,
  costPerFoot,
  findEngineered,
  findSawnSize,
  findSawnValues,
  findSteelGrade,
  findWShape,
  itemKey,
  SAWN_GRADES,
  sawnValuesForSize,
  sizeFactorFor,
  SPECIES,
  STARTER_TABLES,
  TableLookupError,
} from "@/lib/tables";

const T = STARTER_TABLES;

function lookupError(fn: () => unknown): TableLookupError {
  try {
    fn();
  } catch (e) {
    if (e instanceof TableLookupError) return e;
    throw e;
  }
  throw new Error("expected a TableLookupError");
}

describe("lookups find what the tables hold", () => {
  test("sizes and shapes are found however they are typed", () => {
    expect(findSawnSize(T, "2X10").name).toBe("2x10");
    expect(findSawnSize(T, " 2x10 ").d).toBe(9.25);
    expect(findWShape(T, "w8x18").name).toBe("W8x18");
    expect(findWShape(T, "W8X18").Sx).toBe(15.2);
    expect(findEngineered(T, "lvl 1.9e").name).toBe("LVL 1.9E");
    expect(findSteelGrade(T, "a992").Fy).toBe(50);
  });

  test("Southern Pine values come from the row of the size's width", () => {
    expect(sawnValuesForSize(T, "Southern Pine", "No.2", "2x10").Fb).toBe(800);
    expect(sawnValuesForSize(T, "Southern Pine", "No.2", "4x10").Fb).toBe(800);
    expect(findSawnValues(T, "Southern Pine", "No.2", "dimension", 5).nominalDepth).toBe(6);
    expect(findSawnValues(T, "Southern Pine", "No.2", "dimension", 14).nominalDepth).toBe(12);
  });

  test("every sawn size, species and grade the tables hold has values and size factors", () => {
    for (const species of SPECIES) {
      for (const grade of SAWN_GRADES) {
        for (const size of T.sawnSizes) {
          const hasValues = T.sawnValues.some((v) => v.species === species && v.grade === grade && v.sizeClass === size.sizeClass);
          if (!hasValues) continue;
          const cf = sizeFactorFor(T, species, grade, size.name);
          expect(cf.CF_Fb).toBeGreaterThan(0);
          expect(sawnValuesForSize(T, species, grade, size.name).Fb).toBeGreaterThan(0);
        }
      }
    }
  });
});

describe("lookup errors name the field and list what the tables hold", () => {
  test("unknown size", () => {
    const e = lookupError(() => findSawnSize(T, "2x11"));
    expect(e.field).toBe("member.size");
    expect(e.message).toBe(`unknown size "2x11"; the tables hold ${T.sawnSizes.map((s) => s.name).join(", ")}`);
    expect(e.message).toContain("2x4, 2x6, 2x8");
  });

  test("unknown species", () => {
    const e = lookupError(() => findSawnValues(T, "Redwood" as never, "No.2", "dimension"));
    expect(e.field).toBe("member.species");
    expect(e.message).toBe('unknown species "Redwood"; the tables hold Douglas Fir-Larch, Hem-Fir, Spruce-Pine-Fir, Southern Pine');
  });

  test("a grade the size class does not have (No.3 beams and stringers)", () => {
    const e = lookupError(() => sawnValuesForSize(T, "Douglas Fir-Larch", "No.3", "6x10"));
    expect(e.field).toBe("member.grade");
    expect(e.message).toContain("the tables hold Select Structural, No.1, No.2");
  });

  test("a size class a species lacks (Southern Pine timbers)", () => {
    const e = lookupError(() => sawnValuesForSize(T, "Southern Pine", "No.1", "6x12"));
    expect(e.field).toBe("member.size");
    expect(e.message).toContain("no beams-stringers values for Southern Pine");
  });

  test("Southern Pine without a depth", () => {
    const e = lookupError(() => findSawnValues(T, "Southern Pine", "No.2", "dimension"));
    expect(e.message).toContain("the tables hold 4 in, 6 in, 8 in, 10 in, 12 in");
  });

  test("unknown shape, product, grade, width and depth", () => {
    const shape = lookupError(() => findWShape(T, "W14x22"));
    expect(shape.field).toBe("member.shape");
    expect(shape.message).toMatch(/^unknown shape "W14x22"; the tables hold W6x9, W6x12, /);
    expect(lookupError(() => findEngineered(T, "LSL 1.55E")).message).toContain("LVL 1.9E, LVL 2.0E, PSL 2.0E");
    expect(lookupError(() => findSteelGrade(T, "A572")).message).toBe('unknown steel grade "A572"; the tables hold A992, A36');
    const lvl = findEngineered(T, "LVL 1.9E");
    expect(lookupError(() => checkEngineeredSize(lvl, 3.5, 11.875)).field).toBe("member.width");
    expect(lookupError(() => checkEngineeredSize(lvl, 1.75, 13)).field).toBe("member.depth");
    expect(() => checkEngineeredSize(lvl, 1.75, 11.875)).not.toThrow();
  });
});

describe("cost keys", () => {
  test("itemKey names each kind of member", () => {
    expect(itemKey({ material: "sawn", species: "Hem-Fir", grade: "No.2", size: "2X10" })).toBe("sawn|Hem-Fir|No.2|2x10");
    expect(itemKey({ material: "steel", shape: "w8x18" })).toBe("steel|W8x18");
    expect(itemKey({ material: "engineered", product: "LVL 1.9E", width: 1.75, depth: 11.875 })).toBe("engineered|LVL 1.9E|1.75x11.875");
  });

  test("the starter version has a demo cost for every item it holds", () => {
    expect(T.version).toBe("starter-2026.3");
    for (const s of T.coldFormed ?? []) expect(costPerFoot(T, { material: "cfs", section: s.name })).toBeGreaterThan(0);
    for (const s of T.steel) expect(costPerFoot(T, { material: "steel", shape: s.name })).toBeGreaterThan(0);
    for (const p of T.engineered) {
      for (const width of p.widths) {
        for (const depth of p.depths) expect(costPerFoot(T, { material: "engineered", product: p.name, width, depth })).toBeGreaterThan(0);
      }
    }
    for (const v of T.sawnValues) {
      for (const size of T.sawnSizes.filter((s) => s.sizeClass === v.sizeClass)) {
        expect(costPerFoot(T, { material: "sawn", species: v.species, grade: v.grade, size: size.name })).toBeGreaterThan(0);
      }
    }
  });
});
