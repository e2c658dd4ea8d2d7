import { TABLE_SPECS, type TableKey } from "@/lib/tables/schemas";

/**
 * A table row and a column as an admin reads them in the history, instead of the internal keys the
 * version store matches rows on: "Douglas Fir-Larch|No.2|dimension|all" → "Douglas Fir-Larch No.2,
 * dimension lumber, every depth"; "Fb_psi" → "Fb (psi)".
 */

const SIZE_CLASS_WORDS: Record<string, string> = { dimension: "dimension lumber", "beams-stringers": "beams and stringers" };
const MATERIAL_WORDS: Record<string, string> = { sawn: "Sawn lumber", engineered: "Engineered lumber and I-joists", steel: "Steel" };

function inches(value: string): string {
  const n = Number(value);
  if (!Number.isFinite(n)) return value;
  const whole = Math.floor(n);
  const sixteenths = Math.round((n - whole) * 16);
  if (sixteenths === 0) return `${whole}`;
  const g = sixteenths % 8 === 0 ? 8 : sixteenths % 4 === 0 ? 4 : sixteenths % 2 === 0 ? 2 : 1;
  return `${whole ? `${whole}-` : ""}${sixteenths / g}/${16 / g}`;
}

/** A cost table item key in words: "2x10 Douglas Fir-Larch No.2", "LVL 2.0E 1-3/4 x 11-7/8 in", "W8x18 steel". */
export function itemWords(itemKey: string): string {
  const [material, ...rest] = itemKey.split("|");
  if (material === "sawn" && rest.length === 3) return `${rest[2]} ${rest[0]} ${rest[1]}`;
  if (material === "engineered" && rest.length === 2) {
    const [w, d] = rest[1].split("x");
    return `${rest[0]} ${inches(w)} x ${inches(d)} in`;
  }
  if (material === "steel" && rest.length === 1) return `${rest[0]} steel`;
  if (material === "ijoist" && rest.length === 1) return `${rest[0]} I-joist`;
  if (material === "cfs" && rest.length === 1) return `${rest[0]} cold-formed steel`;
  return itemKey.replaceAll("|", " ");
}

export function rowWords(table: TableKey, key: string): string {
  const parts = key.split("|");
  switch (table) {
    case "sawn-values": {
      const [species, grade, sizeClass, depth] = parts;
      return `${species} ${grade}, ${SIZE_CLASS_WORDS[sizeClass] ?? sizeClass}, ${depth === "all" || depth === undefined ? "every depth" : `${depth} in nominal depth`}`;
    }
    case "size-factors": {
      const [ref, grades, depth, thickness] = parts;
      return `Table ${ref}, ${grades.split(";").join(", ")}, ${depth} in deep${thickness && thickness !== "0" ? `, ${thickness} in thick` : ""}`;
    }
    case "costs":
      return itemWords(key);
    case "stock-lengths":
      return MATERIAL_WORDS[key] ?? key;
    default:
      return key;
  }
}

/** A column of a table by its label and unit: "Fb_psi" → "Fb (psi)". */
export function columnWords(table: TableKey, column: string): string {
  const field = TABLE_SPECS[table].fields.find((f) => f.name === column);
  if (!field) return column;
  return field.unit ? `${field.label} (${field.unit})` : field.label;
}
