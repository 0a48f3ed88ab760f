// The payment service's request encoding: application/x-www-form-urlencoded with bracket keys,
// as the SDK writes them (`line_items[0][price_data][unit_amount]=1200`, `expand[0]=line_items`,
// `expand[]=line_items`, `metadata[order]=42`). Decoded with URLSearchParams, then expanded here
// into nested objects; a group whose keys are all indices (or `[]`) becomes an array.

export type FormValue = string | FormObject | FormValue[];
export type FormObject = { [key: string]: FormValue };

const UNSAFE_KEYS = new Set(["__proto__", "constructor", "prototype"]);

export class FormError extends Error {
  constructor(readonly param: string) {
    super(`Invalid parameter name: ${param}`);
  }
}

/** `a[b][0][c]` → ["a", "b", "0", "c"]; `expand[]` → ["expand", ""]. Throws FormError on a bad name. */
export function splitKey(key: string): string[] {
  const match = key.match(/^([^[\]]+)((?:\[[^[\]]*\])*)$/);
  if (!match) throw new FormError(key);
  const parts = [match[1]];
  for (const m of match[2].matchAll(/\[([^[\]]*)\]/g)) parts.push(m[1]);
  if (parts.some((p) => UNSAFE_KEYS.has(p))) throw new FormError(key);
  return parts;
}

/** Decodes a query string or form body into a nested object. */
export function parseForm(encoded: string): FormObject {
  const root: Record<string, unknown> = Object.create(null);
  for (const [key, value] of new URLSearchParams(encoded)) {
    const parts = splitKey(key);
    let node: Record<string, unknown> = root;
    parts.forEach((rawPart, i) => {
      // `[]` appends: give it the next free index of this group.
      const part = rawPart === "" ? String(Object.keys(node).length) : rawPart;
      if (i === parts.length - 1) {
        if (typeof node[part] === "object") throw new FormError(key);
        node[part] = value;
        return;
      }
      const next = node[part];
      if (typeof next === "string") throw new FormError(key);
      node[part] ??= Object.create(null);
      node = node[part] as Record<string, unknown>;
    });
  }
  return toArrays(root) as FormObject;
}

/** Groups keyed 0..n-1 become arrays (in index order), recursively. */
function toArrays(node: unknown): FormValue {
  if (typeof node === "string") return node;
  const entries = Object.entries(node as Record<string, unknown>);
  const converted = entries.map(([k, v]) => [k, toArrays(v)] as const);
  const indices = entries.length > 0 && entries.every(([k]) => /^\d+$/.test(k));
  if (indices) {
    const sorted = converted.map(([k, v]) => [Number(k), v] as const).sort((a, b) => a[0] - b[0]);
    if (sorted.every(([k], i) => k === i)) return sorted.map(([, v]) => v);
  }
  const out: FormObject = {};
  for (const [k, v] of converted) out[k] = v;
  return out;
}
