/**
 * Writes a migration from the difference between the entities and a database migrated by the
 * existing migrations. Usage: npm run db:generate -- PascalName. Read the file before committing.
 */
import { writeFileSync } from 'node:fs';
import { isPostgresUrl, openDatabase } from './data-source';

const name = process.argv[2];
if (!name || !/^[A-Z][A-Za-z0-9]+$/.test(name)) {
  console.error('Usage: npm run db:generate -- PascalName');
  process.exit(1);
}
const target = process.env.DATABASE_URL ?? ':memory:';
const folder = isPostgresUrl(target) ? 'migrations-postgres' : 'migrations';
const ds = await openDatabase(target);
const log = await ds.driver.createSchemaBuilder().log();
await ds.destroy();
if (log.upQueries.length === 0) {
  console.log('No changes: the entities match the migrations.');
  process.exit(0);
}
const stamp = Date.now();
const cls = `${name}${stamp}`;
const q = (s: string) => '`' + s.replace(/`/g, '\\`') + '`';
const up = log.upQueries.map((x) => `    await queryRunner.query(${q(x.query)});`).join('\n');
const down = log.downQueries
  .reverse()
  .map((x) => `    await queryRunner.query(${q(x.query)});`)
  .join('\n');
const file = `server/db/${folder}/${stamp}-${name}.ts`;
writeFileSync(
  file,
  `import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ${cls} implements MigrationInterface {
  name = '${cls}';

  public async up(queryRunner: QueryRunner): Promise<void> {
${up}
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
${down}
  }
}
`,
);
console.log(`Wrote ${file}; add it to server/db/${folder}/index.ts`);
