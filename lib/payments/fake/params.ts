// Reading a decoded request (form.ts) the way the service validates it: every parameter must be
// one the endpoint knows (else `parameter_unknown`), integers must be integers
// (`parameter_invalid_integer`), required ones present (`parameter_missing`). Parameter names in
// errors are written as the client sent them: `line_items[0][quantity]`.
import type { FormObject, FormValue } from "./form";
import { ApiError, invalidParam, missingParam, unknownParam } from "./wire";

export class Params {
  constructor(
    private readonly data: FormObject,
    private readonly prefix = "",
  ) {}

  name(key: string): string {
    return this.prefix ? `${this.prefix}[${key}]` : key;
  }

  /** Refuses any parameter outside `known` (`expand` is accepted on every endpoint). */
  only(known: string[]): this {
    for (const key of Object.keys(this.data)) {
      if (key !== "expand" && !known.includes(key)) throw unknownParam(this.name(key));
    }
    return this;
  }

  has(key: string): boolean {
    return this.data[key] !== undefined;
  }

  string(key: string): string | undefined {
    const v = this.data[key];
    if (v === undefined) return undefined;
    if (typeof v !== "string") throw invalidParam(this.name(key), `Invalid string: ${this.name(key)} must be a string.`);
    return v;
  }

  requiredString(key: string): string {
    const v = this.string(key);
    if (v === undefined || v === "") throw missingParam(this.name(key));
    return v;
  }

  int(key: string, { min, max }: { min?: number; max?: number } = {}): number | undefined {
    const v = this.string(key);
    if (v === undefined) return undefined;
    if (!/^-?\d+$/.test(v)) throw new ApiError(400, "invalid_request_error", `Invalid integer: ${v}`, "parameter_invalid_integer", this.name(key));
    const n = Number(v);
    if ((min !== undefined && n < min) || (max !== undefined && n > max) || !Number.isSafeInteger(n)) {
      const range = max === undefined ? `greater than or equal to ${min}` : `between ${min} and ${max}`;
      throw new ApiError(400, "invalid_request_error", `This value must be ${range}.`, "parameter_invalid_integer", this.name(key));
    }
    return n;
  }

  boolean(key: string): boolean | undefined {
    const v = this.string(key);
    if (v === undefined) return undefined;
    if (v !== "true" && v !== "false") throw invalidParam(this.name(key), `Invalid boolean: ${v}`);
    return v === "true";
  }

  object(key: string): Params | undefined {
    const v = this.data[key];
    if (v === undefined) return undefined;
    if (typeof v === "string" || Array.isArray(v)) throw invalidParam(this.name(key), `Invalid object: ${this.name(key)} must be an object (use ${this.name(key)}[key]=value).`);
    return new Params(v, this.name(key));
  }

  /** An array parameter; each element as Params (objects) or string (scalars). */
  array(key: string): FormValue[] | undefined {
    const v = this.data[key];
    if (v === undefined) return undefined;
    if (!Array.isArray(v)) throw invalidParam(this.name(key), `Invalid array: ${this.name(key)} must be an array (use ${this.name(key)}[0]=…).`);
    return v;
  }

  objects(key: string): Params[] | undefined {
    return this.array(key)?.map((v, i) => {
      if (typeof v === "string" || Array.isArray(v)) throw invalidParam(`${this.name(key)}[${i}]`, `Invalid object: ${this.name(key)}[${i}] must be an object.`);
      return new Params(v, `${this.name(key)}[${i}]`);
    });
  }

  strings(key: string): string[] | undefined {
    return this.array(key)?.map((v, i) => {
      if (typeof v !== "string") throw invalidParam(`${this.name(key)}[${i}]`, `Invalid string: ${this.name(key)}[${i}] must be a string.`);
      return v;
    });
  }

  /** `expand[]`: the dotted paths to expand. */
  expand(): string[] {
    return this.strings("expand") ?? [];
  }

  /**
   * `metadata[key]=value`: at most 50 keys of up to 40 characters, values up to 500 characters
   * (the service's published limits, docs.stripe.com/api/metadata). An empty string unsets a key.
   */
  metadata(key = "metadata"): Record<string, string> | undefined {
    const v = this.data[key];
    if (v === undefined) return undefined;
    if (v === "") return {};
    const entries = Array.isArray(v) ? v.map((x, i) => [String(i), x] as const) : typeof v === "object" ? Object.entries(v) : null;
    if (!entries) throw invalidParam(this.name(key), `Invalid object: ${this.name(key)} must be an object.`);
    if (entries.length > 50) throw invalidParam(this.name(key), "Invalid metadata: metadata can have up to 50 keys.");
    const out: Record<string, string> = {};
    for (const [k, value] of entries) {
      if (typeof value !== "string") throw invalidParam(`${this.name(key)}[${k}]`, `Invalid metadata value for ${k}: it must be a string.`);
      if (k.length > 40) throw invalidParam(`${this.name(key)}[${k}]`, `Metadata keys can have up to 40 characters, but you passed in a key with ${k.length} characters.`);
      if (value.length > 500) throw invalidParam(`${this.name(key)}[${k}]`, `Metadata values can have up to 500 characters, but you passed in a value with ${value.length} characters.`);
      if (value !== "") out[k] = value;
    }
    return out;
  }
}
