/**
 * JSON Schema of the system file, generated from the zod schema so the two cannot
 * drift. `npm run schema` writes it to src/io/system-file.schema.json for editors
 * (add "$schema": "<path to that file>" to a system file); a test checks that the
 * committed file equals what this function produces.
 */
import { z } from 'zod';
import { systemFileSchema } from './system-schema.ts';

export function systemJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(systemFileSchema, { io: 'input', unrepresentable: 'any' }) as Record<string, unknown>;
  return {
    ...schema,
    title: 'hesper system file',
    description: 'A planet, its star, measured optical signals and the assumptions of the interpretation.',
  };
}

export function systemJsonSchemaText(): string {
  return `${JSON.stringify(systemJsonSchema(), null, 2)}\n`;
}
