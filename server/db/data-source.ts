import 'reflect-metadata';
import fs from 'node:fs';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { entities } from './entities';
import { migrations } from '../migrations';

/** `file` is a path to the SQLite file, or ':memory:' for tests. */
export function createDataSource(file: string): DataSource {
  if (file !== ':memory:') fs.mkdirSync(path.dirname(file), { recursive: true });
  return new DataSource({
    type: 'better-sqlite3',
    database: file,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    prepareDatabase: (db: { pragma(sql: string): unknown }) => {
      db.pragma('journal_mode = WAL');
      db.pragma('synchronous = NORMAL');
      db.pragma('busy_timeout = 5000');
    },
  });
}

export async function openDatabase(file: string): Promise<DataSource> {
  const ds = createDataSource(file);
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  return ds;
}
