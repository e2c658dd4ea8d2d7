/**
 * Stripe's request encoding: `application/x-www-form-urlencoded` (and the same in the query string of a
 * GET or DELETE), with nested keys written `a[b][c]=v` and arrays `items[0][price]=p` or `expand[]=x`.
 * Every leaf is a string, as Stripe receives it; "true"/"false" and numbers are read by the endpoint.
 */
export type FormValue = string | FormValue[] | { [key: string]: FormValue };
export type FormObject = { [key: string]: FormValue };

export class FormParseError extends Error {
  constructor(
    message: string,
    readonly param: string,
  ) {
    super(message);
  }
}

/** Splits `items[0][price]` into ["items", "0", "price"]; `expand[]` into ["expand", ""]. */
function splitKey(key: string): string[] {
  const first = key.indexOf("[");
  if (first === -1) return [key];
  const parts = [key.slice(0, first)];
  const rest = key.slice(first);
  const re = /\[([^\]]*)\]/g;
  let consumed = 0;
  for (let m = re.exec(rest); m; m = re.exec(rest)) {
    if (m.index !== consumed) throw new FormParseError(`Invalid parameter name: ${key}`, key);
    parts.push(m[1]);
    consumed = m.index + m[0].length;
  }
  if (consumed !== rest.length) throw new FormParseError(`Invalid parameter name: ${key}`, key);
  return parts;
}

type Node = { [key: string]: Node | string };

function insert(root: Node, parts: string[], value: string, fullKey: string): void {
  let node = root;
  for (let i = 0; i < parts.length; i += 1) {
    const last = i === parts.length - 1;
    const part = parts[i] === "" ? String(Object.keys(node).length) : parts[i];
    if (last) {
      if (typeof node[part] === "object") throw new FormParseError(`Invalid parameter: ${fullKey} is both a value and an object`, fullKey);
      node[part] = value;
      return;
    }
    const next = node[part];
    if (next === undefined) {
      const created: Node = {};
      node[part] = created;
      node = created;
    } else if (typeof next === "string") {
      throw new FormParseError(`Invalid parameter: ${fullKey} is both a value and an object`, fullKey);
    } else {
      node = next;
    }
  }
}

/** Objects whose keys are exactly 0..n-1 become arrays, as Stripe reads `items[0]`, `items[1]`. */
function finish(node: Node | string): FormValue {
  if (typeof node === "string") return node;
  const keys = Object.keys(node);
  const isArray =
    keys.length > 0 &&
    keys.every((k) => /^\d+$/.test(k)) &&
    keys
      .map(Number)
      .sort((a, b) => a - b)
      .every((n, i) => n === i);
  if (isArray) {
    return keys
      .map(Number)
      .sort((a, b) => a - b)
      .map((n) => finish(node[String(n)]));
  }
  const out: FormObject = {};
  for (const k of keys) out[k] = finish(node[k]);
  return out;
}

/** Parses a form-encoded body or query string into Stripe's nested parameters. */
export function parseStripeForm(text: string): FormObject {
  const root: Node = {};
  const search = new URLSearchParams(text);
  for (const [key, value] of search) {
    insert(root, splitKey(key), value, key);
  }
  const out = finish(root);
  return typeof out === "object" && !Array.isArray(out) ? out : {};
}

/** Reads a parameter as a string, or undefined when absent. Objects and arrays are a 400. */
export function str(params: FormObject, key: string): string | undefined {
  const v = params[key];
  if (v === undefined) return undefined;
  if (typeof v !== "string") throw new FormParseError(`Invalid string: ${key} must be a string`, key);
  return v;
}

export function bool(params: FormObject, key: string): boolean | undefined {
  const v = str(params, key);
  if (v === undefined) return undefined;
  if (v === "true") return true;
  if (v === "false") return false;
  throw new FormParseError(`Invalid boolean: ${v}`, key);
}

export function int(params: FormObject, key: string): number | undefined {
  const v = str(params, key);
  if (v === undefined) return undefined;
  if (!/^-?\d+$/.test(v)) throw new FormParseError(`Invalid integer: ${v}`, key);
  return Number(v);
}

export function obj(params: FormObject, key: string): FormObject | undefined {
  const v = params[key];
  if (v === undefined || v === "") return undefined;
  if (typeof v !== "object" || Array.isArray(v)) throw new FormParseError(`Invalid hash: ${key} must be a hash`, key);
  return v;
}

export function list(params: FormObject, key: string): FormValue[] | undefined {
  const v = params[key];
  if (v === undefined) return undefined;
  if (!Array.isArray(v)) throw new FormParseError(`Invalid array: ${key} must be an array`, key);
  return v;
}

export function stringList(params: FormObject, key: string): string[] | undefined {
  const v = list(params, key);
  if (v === undefined) return undefined;
  return v.map((item, i) => {
    if (typeof item !== "string") throw new FormParseError(`Invalid string: ${key}[${i}] must be a string`, `${key}[${i}]`);
    return item;
  });
}

/** Metadata: string values only; an empty string removes a key when updating, as in Stripe. */
export function metadata(params: FormObject, key = "metadata"): Record<string, string> | undefined {
  const v = obj(params, key);
  if (v === undefined) return params[key] === "" ? {} : undefined;
  const out: Record<string, string> = {};
  for (const [k, value] of Object.entries(v)) {
    if (typeof value !== "string") throw new FormParseError(`Invalid metadata: ${key}[${k}] must be a string`, `${key}[${k}]`);
    out[k] = value;
  }
  return out;
}
