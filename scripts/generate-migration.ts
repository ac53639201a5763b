/**
 * Writes a migration with the SQL that brings a fully migrated database up to
 * the current entities (what `typeorm migration:generate` does), and registers
 * it in server/migrations/index.ts. Usage: npm run migration:generate -- AddMeters
 */
import fs from 'node:fs';
import path from 'node:path';
import { openDatabase } from '../server/db/data-source';

async function main() {
  const name = process.argv[2];
  if (!name || !/^[A-Z][A-Za-z0-9]+$/.test(name)) {
    console.error('Give the migration a PascalCase name: npm run migration:generate -- AddMeters');
    process.exit(1);
  }
  const ds = await openDatabase(':memory:');
  const sql = await ds.driver.createSchemaBuilder().log();
  await ds.destroy();
  if (sql.upQueries.length === 0) {
    console.log('The entities match the migrations; nothing to generate.');
    return;
  }
  const stamp = Date.now();
  const className = `${name}${stamp}`;
  const q = (s: string) => '`' + s.replace(/\\/g, '\\\\').replace(/`/g, '\\`').replace(/\$\{/g, '\\${') + '`';
  const up = sql.upQueries.map((x) => `    await queryRunner.query(${q(x.query)});`).join('\n');
  const down = sql.downQueries.reverse().map((x) => `    await queryRunner.query(${q(x.query)});`).join('\n');
  const file = `${stamp}-${name.replace(/([a-z0-9])([A-Z])/g, '$1-$2').toLowerCase()}`;
  const dir = path.resolve(__dirname, '../server/migrations');
  fs.writeFileSync(
    path.join(dir, `${file}.ts`),
    `import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ${className} implements MigrationInterface {
  name = '${className}';

  public async up(queryRunner: QueryRunner): Promise<void> {
${up}
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
${down}
  }
}
`,
  );
  const indexFile = path.join(dir, 'index.ts');
  const imports = fs
    .readdirSync(dir)
    .filter((f) => /^\d+-.*\.ts$/.test(f))
    .sort()
    .map((f) => {
      const src = fs.readFileSync(path.join(dir, f), 'utf8');
      const cls = /export class (\w+)/.exec(src)![1];
      return { cls, mod: `./${f.replace(/\.ts$/, '')}` };
    });
  fs.writeFileSync(
    indexFile,
    `/** Every migration, in order. \`npm run migration:generate -- <Name>\` appends to this list. */\n` +
      imports.map((i) => `import { ${i.cls} } from '${i.mod}';`).join('\n') +
      `\n\nexport const migrations = [${imports.map((i) => i.cls).join(', ')}];\n`,
  );
  console.log(`Wrote server/migrations/${file}.ts (${sql.upQueries.length} statements).`);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
