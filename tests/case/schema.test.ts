/** The JSON Schema printed by `fincheck schema`: every key has a description giving its meaning (and unit). */
import { describe, expect, it } from 'vitest';
import { caseJsonSchema, profileNames } from '../../src/case/schema.js';

interface JsonSchema {
  description?: string;
  properties?: Record<string, JsonSchema>;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  items?: JsonSchema;
  prefixItems?: JsonSchema[];
  required?: string[];
  additionalProperties?: boolean;
  const?: unknown;
}

/** Every property schema in the tree, with its key path. */
function properties(schema: JsonSchema, path = ''): [string, JsonSchema][] {
  const out: [string, JsonSchema][] = [];
  for (const [key, child] of Object.entries(schema.properties ?? {})) {
    out.push([`${path}${key}`, child]);
    out.push(...properties(child, `${path}${key}.`));
  }
  for (const child of [...(schema.anyOf ?? []), ...(schema.oneOf ?? []), ...(schema.prefixItems ?? [])]) out.push(...properties(child, path));
  if (schema.items) out.push(...properties(schema.items, path));
  return out;
}

describe('caseJsonSchema', () => {
  const schema = caseJsonSchema() as JsonSchema;

  it('is a draft 2020-12 schema of a strict mapping with the contract keys', () => {
    expect((schema as Record<string, unknown>)['$schema']).toBe('https://json-schema.org/draft/2020-12/schema');
    // units (bare-length unit, issue 9) was added after the contract's five keys; display and extends by issue 13;
    // uncertainty by design-questions.md (issue 12).
    expect(Object.keys(schema.properties ?? {})).toEqual(['name', 'fin', 'material', 'convection', 'base', 'units', 'display', 'extends', 'uncertainty']);
    expect(schema.required).toEqual(['fin', 'material', 'convection', 'base']);
    expect(schema.additionalProperties).toBe(false);
  });

  it('describes every key (the profile tag excepted: its value is the description)', () => {
    const all = properties(schema);
    expect(all.length).toBeGreaterThan(40);
    const undescribed = all.filter(([key, s]) => !key.endsWith('profile') && !s.description).map(([key]) => key);
    expect(undescribed).toEqual([]);
  });

  it('states the unit of quantities in their description', () => {
    const fin = schema.properties?.fin;
    const rectangular = fin?.oneOf?.find((option) => option.properties?.profile?.const === 'rectangular');
    expect(rectangular?.properties?.thickness?.description).toMatch(/, m\. A length > 0 such as "2 mm"/);
    expect(schema.properties?.convection?.properties?.ambient?.description).toMatch(/degC/);
    expect(fin?.oneOf?.map((option) => option.properties?.profile?.const)).toEqual([...profileNames]);
  });
});
