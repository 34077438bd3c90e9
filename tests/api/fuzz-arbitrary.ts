/**
 * Request bodies derived from a route's own zod schema for the fuzz suite (fuzz.test.ts): fast-check arbitraries
 * that mostly follow the schema's shape (objects with its keys, enum values, numbers near its bounds, strings of
 * its lengths) and, at any node, put something hostile in its place: a wrong type, a boundary or extreme number,
 * a huge array, a string with NUL or a lone surrogate, a deeply nested object, a prototype key. So most cases are
 * wrong in one or a few places deep inside an otherwise plausible body, which is where validation slips.
 *
 * Reads zod 3's schema definitions (`_def.typeName` and checks); an unknown kind of node gets hostile values only.
 */
import fc from 'fast-check';
import type { ZodTypeAny } from 'zod';

/** How deep the derivation follows nested and recursive schemas before it answers hostile values only. */
const DEPTH_MAX = 12;
/** Longest array of plausible elements a case holds (bounds above it are tested by the huge-array values). */
const ARRAY_PLAUSIBLE_MAX = 6;

/** Longest bound an array one past it is built for (longer bounds are met by the request caps first). */
const ARRAY_PAST_BOUND_MAX = 10_000;

/** Numbers that break arithmetic or storage: extremes, subnormals, negative zero, just past the safe integers. */
const EXTREME_NUMBERS = [
  0,
  -0,
  1,
  -1,
  0.5,
  1e308,
  -1e308,
  Number.MAX_VALUE,
  5e-324,
  -5e-324,
  Number.MAX_SAFE_INTEGER + 2,
  -(Number.MAX_SAFE_INTEGER + 2),
  2 ** 31,
  -(2 ** 31) - 1,
  1e21,
  123456789.12345679,
];

/** Strings no text column or renderer should choke on. */
const HOSTILE_STRINGS = [
  '',
  ' ',
  '\u0000',
  'a\u0000b',
  '\ud800',
  'x\udfffy',
  '\ufeff',
  '\u202e',
  "'; drop table kits; --",
  '<script>alert(1)</script>',
  '../../etc/passwd',
  '%00',
  '%',
  '1e308',
  'NaN',
  '-Infinity',
  '00000000-0000-4000-8000-000000000000',
  'ａｂｃ',
  '𝕂𝕚𝕥',
  '\r\nSet-Cookie: x=1',
];

/** A JSON value of any shape (what JSON.parse could give), small. */
const anyJson: fc.Arbitrary<unknown> = fc.jsonValue({ maxDepth: 3 });

/** Something small that should not be where it is: a wrong type, an extreme number, a hostile string. */
const hostileSmall: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(...EXTREME_NUMBERS),
  fc.constantFrom(...HOSTILE_STRINGS),
  fc.constantFrom(null, true, false, [], {}),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer(),
  fc.string({ unit: 'binary', maxLength: 40 }),
  anyJson,
);

/** Something that should not be where it is: any JSON of a hostile flavour, big ones included. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { arbitrary: hostileSmall, weight: 7 },
  // A huge string and a huge array (still within the request caps most of the time).
  fc.integer({ min: 1_000, max: 60_000 }).map((n) => 'x'.repeat(n)),
  fc.integer({ min: 1_000, max: 20_000 }).map((n) => Array.from({ length: n }, (_, i) => i)),
  // Deep nesting, and keys that reach for the prototype.
  fc.integer({ min: 50, max: 2_000 }).map((n) => {
    let v: unknown = 1;
    for (let i = 0; i < n; i++) v = { a: v };
    return v;
  }),
  fc.constant(JSON.parse('{"__proto__":{"admin":true},"constructor":{"prototype":{"x":1}}}')),
);

interface ZodDefLike {
  typeName?: string;
  [key: string]: unknown;
}

function def(schema: ZodTypeAny): ZodDefLike {
  return (schema as unknown as { _def: ZodDefLike })._def;
}

/** Numbers near a number schema's bounds (both sides of each), whole when it wants whole numbers. */
function numberArbitrary(d: ZodDefLike): fc.Arbitrary<unknown> {
  const checks = (d.checks ?? []) as { kind: string; value?: number; inclusive?: boolean }[];
  const min = checks.find((c) => c.kind === 'min')?.value;
  const max = checks.find((c) => c.kind === 'max')?.value;
  const int = checks.some((c) => c.kind === 'int');
  const lo = min ?? (max !== undefined ? Math.min(0, max - 100) : -1000);
  const hi = max ?? (min !== undefined ? Math.max(lo + 100, lo * 2) : 1000);
  const inRange = int
    ? fc.integer({ min: Math.ceil(Math.max(lo, -(2 ** 31))), max: Math.floor(Math.min(hi, 2 ** 31 - 1)) })
    : fc.double({ min: lo, max: hi, noNaN: true, noDefaultInfinity: true });
  const edges = [min, max]
    .filter((v): v is number => v !== undefined)
    .flatMap((v) => [v, v - 1, v + 1, v - Number.EPSILON * Math.max(1, Math.abs(v)), v + 1e-9, v * 10]);
  return edges.length > 0 ? fc.oneof({ arbitrary: inRange, weight: 3 }, fc.constantFrom(...edges)) : inRange;
}

/** Strings of a string schema's lengths and formats. */
function stringArbitrary(d: ZodDefLike): fc.Arbitrary<unknown> {
  const checks = (d.checks ?? []) as { kind: string; value?: number; regex?: RegExp }[];
  if (checks.some((c) => c.kind === 'uuid')) return fc.oneof(fc.uuid(), fc.constant('not-a-uuid'));
  if (checks.some((c) => c.kind === 'email')) return fc.oneof(fc.emailAddress(), fc.constant('no-at-sign'));
  const regex = checks.find((c) => c.kind === 'regex')?.regex;
  if (regex && !regex.flags.includes('u'))
    return fc.oneof(
      fc.stringMatching(regex).filter((s) => s.length < 500),
      fc.string({ maxLength: 20 }),
    );
  const min = checks.find((c) => c.kind === 'min' || c.kind === 'length')?.value ?? 0;
  const max = checks.find((c) => c.kind === 'max' || c.kind === 'length')?.value ?? Math.max(min, 40);
  const lengths = fc.string({ minLength: Math.min(min, 200), maxLength: Math.min(Math.max(max, min), 200) });
  const edges = [min - 1, max, max + 1].filter((n) => n >= 0 && n < 100_000).map((n) => 'w'.repeat(n));
  return fc.oneof({ arbitrary: lengths, weight: 3 }, fc.constantFrom(...edges));
}

/**
 * Values for a zod schema: plausible for its shape, with a hostile value in place of any node now and then
 * (`hostileWeight` in 10 nodes on average, so a big schema's case is usually wrong somewhere, not everywhere).
 * `small` keeps big hostile values and over-long arrays out (inside an over-long array, whose element repeats),
 * so one case stays a few megabytes at most.
 */
export function zodArbitrary(schema: ZodTypeAny, hostileWeight = 1, depth = 0, small = false): fc.Arbitrary<unknown> {
  const hostile = small ? hostileSmall : hostileValue;
  const plausible = depth >= DEPTH_MAX ? hostile : plausibleArbitrary(schema, hostileWeight, depth, small);
  return fc.oneof({ arbitrary: plausible, weight: 10 - hostileWeight }, { arbitrary: hostile, weight: hostileWeight });
}

function plausibleArbitrary(schema: ZodTypeAny, w: number, depth: number, small: boolean): fc.Arbitrary<unknown> {
  const d = def(schema);
  const inner = (s: unknown) => zodArbitrary(s as ZodTypeAny, w, depth + 1, small);
  switch (d.typeName) {
    case 'ZodString':
      return stringArbitrary(d);
    case 'ZodNumber':
      return numberArbitrary(d);
    case 'ZodBigInt':
      return fc.bigInt().map(String);
    case 'ZodBoolean':
      return fc.boolean();
    case 'ZodDate':
      return fc.date({ noInvalidDate: true }).map((t) => t.toISOString());
    case 'ZodLiteral':
      return fc.constant(d.value);
    case 'ZodEnum':
      return fc.constantFrom(...(d.values as unknown[]));
    case 'ZodNativeEnum':
      return fc.constantFrom(...Object.values(d.values as object));
    case 'ZodNull':
      return fc.constant(null);
    case 'ZodUndefined':
    case 'ZodVoid':
      return fc.constant(undefined);
    case 'ZodAny':
    case 'ZodUnknown':
      return anyJson;
    case 'ZodObject': {
      const shape = (d.shape as () => Record<string, ZodTypeAny>)();
      const keys = Object.keys(shape);
      const record = fc.record(Object.fromEntries(keys.map((k) => [k, inner(shape[k])])), {
        requiredKeys: keys.filter((k) => !shape[k]!.isOptional()),
      });
      // Now and then a key the schema does not know.
      return fc.oneof(
        { arbitrary: record, weight: 8 },
        fc
          .tuple(record, fc.string({ minLength: 1, maxLength: 12 }), hostileValue)
          .map(([r, k, v]) => ({ ...r, [k]: v })),
      );
    }
    case 'ZodArray': {
      const minLength = (d.minLength as { value: number } | null)?.value ?? 0;
      const exact = (d.exactLength as { value: number } | null)?.value;
      const maxLength = (d.maxLength as { value: number } | null)?.value;
      const lo = exact ?? minLength;
      const hi = Math.max(lo, Math.min(exact ?? maxLength ?? ARRAY_PLAUSIBLE_MAX, ARRAY_PLAUSIBLE_MAX));
      const plausibleArray = fc.array(inner(d.type), { minLength: Math.min(lo, ARRAY_PLAUSIBLE_MAX), maxLength: hi });
      // One past the maximum (or the minimum) length, of plausible elements repeated.
      const bound = exact ?? maxLength;
      if (small || bound === undefined || bound > ARRAY_PAST_BOUND_MAX) return plausibleArray;
      return fc.oneof(
        { arbitrary: plausibleArray, weight: 6 },
        zodArbitrary(d.type as ZodTypeAny, w, depth + 1, true).map((v) => Array.from({ length: bound + 1 }, () => v)),
      );
    }
    case 'ZodTuple':
      return fc.tuple(...(d.items as ZodTypeAny[]).map(inner));
    case 'ZodRecord':
    case 'ZodMap':
      return fc.dictionary(fc.string({ maxLength: 10 }), inner(d.valueType), { maxKeys: 4 });
    case 'ZodSet':
      return fc.array(inner(d.valueType), { maxLength: 4 });
    case 'ZodUnion':
    case 'ZodDiscriminatedUnion': {
      const options = (
        Array.isArray(d.options) ? d.options : [...(d.options as Map<unknown, ZodTypeAny>).values()]
      ) as ZodTypeAny[];
      return fc.oneof(...options.map(inner));
    }
    case 'ZodIntersection':
      return fc
        .tuple(inner(d.left), inner(d.right))
        .map(([a, b]) => (isPlainObject(a) && isPlainObject(b) ? { ...a, ...b } : a));
    case 'ZodOptional':
      return fc.option(inner(d.innerType), { nil: undefined, freq: 4 });
    case 'ZodNullable':
      return fc.option(inner(d.innerType), { nil: null, freq: 4 });
    case 'ZodDefault':
    case 'ZodCatch':
    case 'ZodReadonly':
      return fc.option(inner(d.innerType), { nil: undefined, freq: 4 });
    case 'ZodEffects':
      return inner(d.schema);
    case 'ZodBranded':
      return inner(d.type);
    case 'ZodPipeline':
      return inner(d.in);
    case 'ZodLazy':
      return fc.constant(null).chain(() => inner((d.getter as () => ZodTypeAny)()));
    case 'ZodPromise':
      return inner(d.type);
    default:
      return hostileValue;
  }
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}
