/** The reference JSON Schema validator (ajv, test-only) compiled from the library schema. */
import Ajv2020 from "ajv/dist/2020";
import schema from "../../src/library/schema/library.schema.json";

export const ajv = new Ajv2020({ allErrors: true, strict: true, strictTypes: false, strictRequired: false });
ajv.addSchema(schema);
export const validateWithAjv = ajv.compile(schema);
/** Validator for one `$defs` entry. */
export function ajvDef(name: string) {
  const v = ajv.getSchema(`urn:protolyte:library:1#/$defs/${name}`);
  if (!v) throw new Error(`no $defs/${name}`);
  return v;
}
