import fc from 'fast-check';
import * as z from 'zod';

/**
 * fast-check values generated from the API's own zod contracts (shared/api), through the JSON Schema
 * zod writes for them (`z.toJSONSchema`, input side). Most values fit the schema's shape, so requests
 * get past the first check and reach the services and the database; at any depth a value may instead
 * be one of the hostile ones a stranger sends (wrong types, huge numbers, lone surrogates, NUL, deep
 * nests, prototype keys), so every check on the way is tried too.
 */
type JsonSchema = {
  type?: string | string[];
  properties?: Record<string, JsonSchema>;
  required?: string[];
  additionalProperties?: JsonSchema | boolean;
  propertyNames?: JsonSchema;
  items?: JsonSchema;
  minItems?: number;
  maxItems?: number;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  allOf?: JsonSchema[];
  enum?: unknown[];
  const?: unknown;
  pattern?: string;
  format?: string;
  minLength?: number;
  maxLength?: number;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
};

const nest = (depth: number): unknown => {
  let value: unknown = 1;
  for (let i = 0; i < depth; i++) value = [value];
  return value;
};

/** What strangers send instead of what a field expects. */
export const hostile: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom<unknown>(
    null,
    true,
    0,
    -1,
    -0,
    1e308,
    -1e308,
    2_147_483_648,
    Number.MAX_SAFE_INTEGER + 2,
    0.1 + 0.2,
    '',
    ' ',
    'a\udfffb',
    '\ud800',
    'nul\u0000byte',
    '<script>alert(1)</script>',
    '=HYPERLINK("x")',
    '../../etc/passwd',
    '%E0%A4%A',
    'x'.repeat(70_000),
    [],
    {},
    { __proto__: { admin: true } },
    JSON.parse('{"__proto__":{"polluted":true}}'),
    nest(200),
    nest(40),
  ),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.double(),
  fc.integer(),
  fc.jsonValue({ maxDepth: 3 }),
);

const stringOf = (s: JsonSchema): fc.Arbitrary<string> => {
  if (s.format === 'email') return fc.emailAddress();
  const maxLength = Math.min(s.maxLength ?? 40, 40);
  const minLength = Math.min(s.minLength ?? 0, maxLength);
  if (s.pattern) {
    return fc.stringMatching(new RegExp(s.pattern)).filter((v) => v.length >= (s.minLength ?? 0) && v.length <= (s.maxLength ?? Infinity));
  }
  return fc.oneof(
    { arbitrary: fc.string({ minLength, maxLength }), weight: 4 },
    { arbitrary: fc.string({ unit: 'grapheme', minLength, maxLength }), weight: 2 },
    { arbitrary: fc.string({ unit: 'binary', minLength, maxLength }), weight: 1 },
  );
};

const numberOf = (s: JsonSchema, integer: boolean): fc.Arbitrary<number> => {
  const min = s.minimum ?? (s.exclusiveMinimum !== undefined ? s.exclusiveMinimum + (integer ? 1 : 1e-9) : -1e6);
  const max = s.maximum ?? (s.exclusiveMaximum !== undefined ? s.exclusiveMaximum - (integer ? 1 : 1e-9) : 1e6);
  if (integer) return fc.integer({ min: Math.max(min, -2_147_483_648), max: Math.min(max, 2_147_483_647) });
  return fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
};

/** A value of the schema's shape, whose parts may each be hostile instead. */
export function fromSchema(schema: JsonSchema, hostileWeight = 1): fc.Arbitrary<unknown> {
  const shaped = (s: JsonSchema): fc.Arbitrary<unknown> => {
    const maybe = (arb: fc.Arbitrary<unknown>) => (hostileWeight === 0 ? arb : fc.oneof({ arbitrary: arb, weight: 12 }, { arbitrary: hostile, weight: hostileWeight }));
    if (s.const !== undefined) return maybe(fc.constant(s.const));
    if (s.enum) return maybe(fc.constantFrom(...s.enum));
    const union = s.anyOf ?? s.oneOf;
    if (union) return fc.oneof(...union.map(shaped));
    if (s.allOf) return shaped(s.allOf[0]);
    const type = Array.isArray(s.type) ? s.type[0] : s.type;
    switch (type) {
      case 'string':
        return maybe(stringOf(s));
      case 'integer':
        return maybe(numberOf(s, true));
      case 'number':
        return maybe(numberOf(s, false));
      case 'boolean':
        return maybe(fc.boolean());
      case 'null':
        return maybe(fc.constant(null));
      case 'array':
        return maybe(fc.array(s.items ? shaped(s.items) : hostile, { minLength: s.minItems ?? 0, maxLength: Math.min(s.maxItems ?? 4, 4) }));
      case 'object': {
        if (!s.properties) {
          const value = typeof s.additionalProperties === 'object' ? shaped(s.additionalProperties) : hostile;
          const key = s.propertyNames ? stringOf(s.propertyNames) : fc.string({ maxLength: 12 });
          return maybe(fc.dictionary(key, value, { maxKeys: 3 }));
        }
        const required = new Set(s.required ?? []);
        const fields = Object.fromEntries(Object.entries(s.properties).map(([name, field]) => [name, shaped(field)]));
        const record = fc.record(fields, { requiredKeys: Object.keys(fields).filter((k) => required.has(k)) });
        return maybe(record);
      }
      default:
        return hostile;
    }
  };
  return shaped(schema);
}

/** The input side of a zod schema as JSON Schema: what a client sends, before transforms and defaults. */
export function jsonSchemaOf(schema: z.ZodType): JsonSchema {
  return z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' }) as JsonSchema;
}

/** Values for a zod contract: mostly of its shape, parts of them hostile. */
export const arbitraryFor = (schema: z.ZodType, hostileWeight = 1) => fromSchema(jsonSchemaOf(schema), hostileWeight);

/** A path parameter: ids that exist, ids that do not, numbers past an integer, text, and malformed encodings. */
export function pathParameter(existing: string[]): fc.Arbitrary<string> {
  return fc.oneof(
    { arbitrary: fc.constantFrom(...existing), weight: 6 },
    { arbitrary: fc.integer({ min: -5, max: 3_000_000_000 }).map(String), weight: 2 },
    { arbitrary: fc.constantFrom('%E0%A4%A', '%', '%ZZ', '%C0%AF', '%00', '..', '%2e%2e', '%2F', '1e3', '0x10', '00001', '99999999999999999999', 'NaN'), weight: 2 },
    { arbitrary: fc.string({ unit: 'binary', maxLength: 30 }).map((s) => encodeURIComponent(s.replace(/[\ud800-\udfff]/g, 'x'))), weight: 2 },
  );
}
