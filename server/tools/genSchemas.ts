import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { publishedJsonSchemas } from "@shared/diagram/jsonSchemas";

// Writes shared/schemas/*.json from the zod schemas. Run: npx tsx server/tools/genSchemas.ts
const folder = fileURLToPath(new URL("../../shared/schemas/", import.meta.url));
for (const [name, schema] of Object.entries(publishedJsonSchemas())) {
  writeFileSync(folder + name, `${JSON.stringify(schema, null, 2)}\n`);
  console.log(`wrote shared/schemas/${name}`);
}
