/** The generated custom-functions metadata (functions.json as Excel reads it), for the docs tests. */
import { join } from "node:path";
import { generateCustomFunctionsMetadata } from "custom-functions-metadata";

export interface MetaParam {
  name: string;
  optional?: boolean;
  description?: string;
}

export interface MetaFunction {
  id: string;
  name: string;
  description?: string;
  helpUrl?: string;
  parameters: MetaParam[];
  result: { dimensionality?: string; type?: string };
}

export async function loadMetadata(): Promise<{ functions: MetaFunction[]; errors: string[] }> {
  const result = await generateCustomFunctionsMetadata([join(__dirname, "..", "..", "src", "functions", "functions.ts")]);
  const functions = (JSON.parse(result.metadataJson) as { functions?: MetaFunction[] }).functions ?? [];
  return { functions, errors: result.errors };
}
