import type { z } from 'zod';
import { dropCheckSchema, squeezeCheckSchema, stackCheckSchema } from './inputs';

type Shape<S> = S extends z.ZodObject<infer T> ? T : never;
type NumberKeys<T> = {
  [K in keyof T]: NonNullable<z.infer<T[K] & z.ZodType>> extends number ? K : never;
}[keyof T];

/** Every number field of the checks' forms, by the name the routes take. */
export type CheckField =
  | NumberKeys<Shape<typeof dropCheckSchema>>
  | NumberKeys<Shape<typeof stackCheckSchema>>
  | NumberKeys<Shape<typeof squeezeCheckSchema>>;

/** The SI unit a schema field declares (through optional and default wrappers), if any. */
function unitOf(schema: z.ZodType): string | undefined {
  let s: z.ZodType | undefined = schema;
  while (s) {
    const unit = (s.meta() as { unit?: string } | undefined)?.unit;
    if (unit) return unit;
    s = (s.def as { innerType?: z.ZodType }).innerType;
  }
  return undefined;
}

function unitsOf(schemas: z.ZodObject[]): Record<CheckField, string> {
  const out: Record<string, string> = {};
  for (const schema of schemas)
    for (const [key, field] of Object.entries(schema.shape)) {
      const unit = unitOf(field as z.ZodType);
      if (unit) out[key] = unit;
    }
  return out as Record<CheckField, string>;
}

/**
 * The SI unit of each number field of the checks, read from the input schemas: the forms convert
 * what the reader types (in their units) with these, so a new field carries its unit with it.
 */
export const FIELD_UNITS = unitsOf([dropCheckSchema, stackCheckSchema, squeezeCheckSchema]);
