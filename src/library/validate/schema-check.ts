/**
 * A small validator for the subset of JSON Schema (draft 2020-12) that library.schema.json uses.
 * It reads the schema file itself, so the runtime and the published schema cannot drift; a test
 * checks that it agrees with ajv on valid and invalid samples. Messages name the field and say what
 * is expected, in words a person can act on. Unknown keywords throw: extending the schema with a
 * keyword this file does not implement must fail loudly in the tests.
 */
import type { ValidationIssue } from "../types";
import { childPath, quote } from "./paths";

export type Schema = { [keyword: string]: unknown };

const ANNOTATIONS = new Set(["$schema", "$id", "title", "description", "$defs", "$comment"]);
export const SUPPORTED_KEYWORDS = new Set([
  ...ANNOTATIONS,
  "$ref", "type", "const", "enum", "required", "properties", "additionalProperties", "propertyNames",
  "maxProperties", "items", "minItems", "maxItems", "minLength", "maxLength", "pattern", "minimum",
  "maximum", "exclusiveMinimum", "allOf", "anyOf", "not", "if", "then",
]);

const MAX_ISSUES = 200;

interface Ctx {
  root: Schema;
  issues: ValidationIssue[];
}

const patterns = new Map<string, RegExp>();

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

function typeMatches(type: string, v: unknown): boolean {
  switch (type) {
    case "object": return isObject(v);
    case "array": return Array.isArray(v);
    case "string": return typeof v === "string";
    case "number": return typeof v === "number" && Number.isFinite(v);
    case "integer": return typeof v === "number" && Number.isInteger(v);
    case "boolean": return typeof v === "boolean";
    case "null": return v === null;
    default: throw new Error(`schema-check: unsupported type '${type}'`);
  }
}

function deepEqual(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((x, i) => deepEqual(x, b[i]));
  if (isObject(a) && isObject(b)) {
    const ka = Object.keys(a);
    return ka.length === Object.keys(b).length && ka.every((k) => Object.prototype.hasOwnProperty.call(b, k) && deepEqual(a[k], b[k]));
  }
  return false;
}

function resolveRef(ctx: Ctx, ref: string): Schema {
  const m = /^#\/\$defs\/([A-Za-z0-9_]+)$/.exec(ref);
  const defs = ctx.root.$defs as Record<string, Schema> | undefined;
  const target = m ? defs?.[m[1]] : undefined;
  if (!target) throw new Error(`schema-check: unresolvable $ref '${ref}'`);
  return target;
}

function regex(source: string): RegExp {
  let re = patterns.get(source);
  if (!re) {
    re = new RegExp(source, "u");
    patterns.set(source, re);
  }
  return re;
}

const codePoints = (s: string): number => Array.from(s).length;
const hint = (schema: Schema): string => (typeof schema.description === "string" ? ` (${schema.description})` : "");

function add(ctx: Ctx, path: string, message: string): void {
  if (ctx.issues.length < MAX_ISSUES) ctx.issues.push({ path, message });
}

/** True when `value` satisfies `schema`, issues appended to ctx (when not silent). */
function check(ctx: Ctx, schema: Schema, value: unknown, path: string): boolean {
  for (const k of Object.keys(schema)) {
    if (!SUPPORTED_KEYWORDS.has(k)) throw new Error(`schema-check: unsupported keyword '${k}'`);
  }
  let ok = true;
  const fail = (p: string, message: string) => {
    ok = false;
    add(ctx, p, message);
  };

  if (typeof schema.$ref === "string" && !check(ctx, resolveRef(ctx, schema.$ref), value, path)) ok = false;

  if (typeof schema.type === "string" && !typeMatches(schema.type, value)) {
    const article = /^[aeiou]/.test(schema.type) ? "an" : "a";
    fail(path, `expected ${article} ${schema.type}, found ${quote(value)}`);
    return false;
  }
  if ("const" in schema && !deepEqual(value, schema.const)) {
    fail(path, `must be ${quote(schema.const)}, found ${quote(value)}${hint(schema)}`);
  }
  if (Array.isArray(schema.enum) && !schema.enum.some((e) => deepEqual(e, value))) {
    fail(path, `must be one of ${schema.enum.map((e) => quote(e)).join(", ")}; found ${quote(value)}`);
  }

  if (typeof value === "string") {
    const n = codePoints(value);
    if (typeof schema.minLength === "number" && n < schema.minLength) {
      fail(path, schema.minLength === 1 ? "must not be empty" : `needs at least ${schema.minLength} characters`);
    }
    if (typeof schema.maxLength === "number" && n > schema.maxLength) fail(path, `is longer than ${schema.maxLength} characters`);
    if (typeof schema.pattern === "string" && !regex(schema.pattern).test(value)) {
      fail(path, `${quote(value)} is not valid${hint(schema)}`);
    }
  }

  if (typeof value === "number") {
    if (typeof schema.minimum === "number" && value < schema.minimum) fail(path, `must be ≥ ${schema.minimum}, found ${value}`);
    if (typeof schema.maximum === "number" && value > schema.maximum) fail(path, `must be ≤ ${schema.maximum}, found ${value}`);
    if (typeof schema.exclusiveMinimum === "number" && value <= schema.exclusiveMinimum) {
      fail(path, `must be > ${schema.exclusiveMinimum}, found ${value}`);
    }
  }

  if (Array.isArray(value)) {
    if (typeof schema.minItems === "number" && value.length < schema.minItems) fail(path, `needs at least ${schema.minItems} items`);
    if (typeof schema.maxItems === "number" && value.length > schema.maxItems) fail(path, `has more than ${schema.maxItems} items`);
    if (isObject(schema.items)) {
      value.forEach((item, i) => {
        if (!check(ctx, schema.items as Schema, item, childPath(path, i))) ok = false;
      });
    }
  }

  if (isObject(value)) {
    const keys = Object.keys(value);
    if (Array.isArray(schema.required)) {
      for (const r of schema.required as string[]) {
        if (!Object.prototype.hasOwnProperty.call(value, r)) fail(path, `missing required field '${r}'${typeof schema.type === "string" ? "" : hint(schema)}`);
      }
    }
    if (typeof schema.maxProperties === "number" && keys.length > schema.maxProperties) {
      fail(path, `has more than ${schema.maxProperties} entries`);
    }
    const props = isObject(schema.properties) ? (schema.properties as Record<string, Schema>) : undefined;
    for (const key of keys) {
      const p = childPath(path, key);
      if (isObject(schema.propertyNames) && !check(ctx, schema.propertyNames as Schema, key, p)) ok = false;
      const own = props && Object.prototype.hasOwnProperty.call(props, key) ? props[key] : undefined;
      if (own) {
        if (!check(ctx, own, value[key], p)) ok = false;
      } else if (schema.additionalProperties === false) {
        fail(p, `unknown field '${key}'`);
      } else if (isObject(schema.additionalProperties)) {
        if (!check(ctx, schema.additionalProperties as Schema, value[key], p)) ok = false;
      }
    }
  }

  if (Array.isArray(schema.allOf)) {
    for (const sub of schema.allOf as Schema[]) if (!check(ctx, sub, value, path)) ok = false;
  }
  if (Array.isArray(schema.anyOf)) {
    if (!(schema.anyOf as Schema[]).some((sub) => silent(ctx, sub, value, path))) {
      fail(path, typeof schema.description === "string" ? schema.description : "does not match any allowed form");
    }
  }
  if (isObject(schema.not) && silent(ctx, schema.not as Schema, value, path)) {
    fail(path, `${quote(value)} is not allowed${hint(schema)}`);
  }
  if (isObject(schema.if) && isObject(schema.then) && silent(ctx, schema.if as Schema, value, path)) {
    if (!check(ctx, schema.then as Schema, value, path)) ok = false;
  }
  return ok;
}

function silent(ctx: Ctx, schema: Schema, value: unknown, path: string): boolean {
  const scratch: Ctx = { root: ctx.root, issues: [] };
  return check(scratch, schema, value, path);
}

/** Validate `value` against `schema` (whose `$defs` resolve `$ref`s), starting at a sub-schema if given. */
export function checkAgainstSchema(root: Schema, value: unknown, start?: Schema): ValidationIssue[] {
  const ctx: Ctx = { root, issues: [] };
  check(ctx, start ?? root, value, "");
  return ctx.issues;
}

/** Every keyword a schema uses, for the test that the validator knows them all. */
export function keywordsIn(schema: unknown, out = new Set<string>()): Set<string> {
  if (Array.isArray(schema)) schema.forEach((s) => keywordsIn(s, out));
  else if (isObject(schema)) {
    for (const [k, v] of Object.entries(schema)) {
      out.add(k);
      if (k === "properties" || k === "$defs") Object.values(v as object).forEach((s) => keywordsIn(s, out));
      else if (k !== "const" && k !== "enum" && k !== "required") keywordsIn(v, out);
    }
  }
  return out;
}
