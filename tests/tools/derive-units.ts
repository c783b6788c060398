// `npm run units:derive`: writes shared/units/derived.ts — the registry's factors as mathjs's unit system derives
// them (shared/units/derive.ts) — and formats it. Run after changing a quantity in shared/units/registry.ts.
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { derivedModuleText } from '../../shared/units/derive';

const file = fileURLToPath(new URL('../../shared/units/derived.ts', import.meta.url));
writeFileSync(file, derivedModuleText());
execFileSync('npx', ['biome', 'format', '--write', file], { stdio: 'inherit' });
console.log(`wrote ${file}`);
