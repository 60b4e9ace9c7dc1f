import type { Metadata } from "../types";
import { invalid, missingParam } from "./errors";

export type Params = Record<string, unknown>;

interface Opts {
  required?: boolean;
}

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** Reads the qs-decoded form body the SDK sends, with the API's parameter errors. */
export class ParamReader {
  constructor(
    readonly params: Params,
    private readonly prefix = "",
  ) {}

  name(key: string): string {
    return this.prefix ? `${this.prefix}[${key}]` : key;
  }

  has(key: string): boolean {
    return this.params[key] !== undefined;
  }

  allowOnly(keys: readonly string[]): this {
    for (const key of Object.keys(this.params)) {
      if (!keys.includes(key)) {
        throw invalid(
          `Received unknown parameter: ${this.name(key)} (the local payment stand-in models only the parameters Gradeline uses)`,
          this.name(key),
          "parameter_unknown",
        );
      }
    }
    return this;
  }

  string(key: string, opts: Opts & { max?: number } = {}): string | undefined {
    const value = this.params[key];
    if (value === undefined) {
      if (opts.required) throw missingParam(this.name(key));
      return undefined;
    }
    if (typeof value !== "string") throw invalid(`Invalid string: ${this.name(key)}`, this.name(key), "parameter_invalid_string");
    if (value === "") {
      if (opts.required) {
        throw invalid(
          `You passed an empty string for '${this.name(key)}'. Empty values unset a parameter, but '${this.name(key)}' cannot be unset.`,
          this.name(key),
          "parameter_invalid_empty",
        );
      }
      return undefined;
    }
    if (opts.max !== undefined && value.length > opts.max) {
      throw invalid(`Invalid ${this.name(key)}: must be at most ${opts.max} characters`, this.name(key), "parameter_invalid_string");
    }
    return value;
  }

  integer(key: string, opts: Opts & { min?: number } = {}): number | undefined {
    const raw = this.string(key, opts);
    if (raw === undefined) return undefined;
    if (!/^-?\d+$/.test(raw)) throw invalid(`Invalid integer: ${raw}`, this.name(key), "parameter_invalid_integer");
    const value = Number(raw);
    if (opts.min !== undefined && value < opts.min) {
      throw invalid(`This value must be greater than or equal to ${opts.min}.`, this.name(key), "parameter_invalid_integer");
    }
    return value;
  }

  oneOf<T extends string>(key: string, values: readonly T[], opts: Opts = {}): T | undefined {
    const raw = this.string(key, opts);
    if (raw === undefined) return undefined;
    if (!(values as readonly string[]).includes(raw)) {
      throw invalid(`Invalid ${this.name(key)}: must be one of ${values.join(", ")}`, this.name(key));
    }
    return raw as T;
  }

  url(key: string, opts: Opts = {}): string | undefined {
    const raw = this.string(key, opts);
    if (raw === undefined) return undefined;
    let protocol = "";
    try {
      protocol = new URL(raw).protocol;
    } catch {
      // falls through to the error below
    }
    if (protocol !== "http:" && protocol !== "https:") throw invalid("Not a valid URL", this.name(key), "url_invalid");
    return raw;
  }

  email(key: string, opts: Opts = {}): string | undefined {
    const raw = this.string(key, { ...opts, max: 512 });
    if (raw !== undefined && !EMAIL.test(raw)) throw invalid(`Invalid email address: ${raw}`, this.name(key), "email_invalid");
    return raw;
  }

  object(key: string, opts: Opts = {}): ParamReader | undefined {
    const value = this.params[key];
    if (value === undefined || value === "") {
      if (opts.required) throw missingParam(this.name(key));
      return undefined;
    }
    if (typeof value !== "object" || value === null || Array.isArray(value)) {
      throw invalid(`Invalid object`, this.name(key), "parameter_invalid_object");
    }
    return new ParamReader(value as Params, this.name(key));
  }

  /** Arrays arrive as `key[0][field]=...`; qs yields an array, or an object with index keys past its limit. */
  list(key: string, opts: Opts = {}): unknown[] {
    const value = this.params[key];
    if (value === undefined || value === "") {
      if (opts.required) throw missingParam(this.name(key));
      return [];
    }
    if (Array.isArray(value)) return value;
    if (typeof value === "object" && value !== null) return Object.values(value);
    return [value];
  }

  objectList(key: string, opts: Opts = {}): ParamReader[] {
    return this.list(key, opts).map((item, index) => {
      const name = `${this.name(key)}[${index}]`;
      if (typeof item !== "object" || item === null || Array.isArray(item))
        throw invalid("Invalid object", name, "parameter_invalid_object");
      return new ParamReader(item as Params, name);
    });
  }

  stringList(key: string): string[] {
    return this.list(key).map((item) => {
      if (typeof item !== "string") throw invalid(`Invalid array`, this.name(key), "parameter_invalid_array");
      return item;
    });
  }

  /** Metadata rules: up to 50 keys, key up to 40 characters, value up to 500; an empty value unsets the key. */
  metadata(key = "metadata", base: Metadata = {}): Metadata {
    const reader = this.object(key);
    if (!reader) return { ...base };
    const out: Metadata = { ...base };
    for (const [k, v] of Object.entries(reader.params)) {
      if (typeof v !== "string") throw invalid("Invalid string", reader.name(k), "parameter_invalid_string");
      if (k.length > 40) throw invalid(`Metadata keys can have up to 40 characters: ${k}`, reader.name(k));
      if (v.length > 500) throw invalid(`Metadata values can have up to 500 characters`, reader.name(k));
      if (v === "") delete out[k];
      else out[k] = v;
    }
    if (Object.keys(out).length > 50) throw invalid("Metadata can have up to 50 keys", this.name(key));
    return out;
  }
}
