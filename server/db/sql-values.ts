/** Values as TypeORM stores them in SQLite, for the prepared statements of hot paths. */

/** "YYYY-MM-DD HH:MM:SS.SSS" in UTC, the datetime format TypeORM writes. */
export const sqlDate = (d: Date) => d.toISOString().replace('T', ' ').replace('Z', '');

/** Reads TypeORM's UTC datetime text back as a Date. */
export const dateFromSql = (s: string) => new Date(`${s.replace(' ', 'T')}Z`);

export const sqlBool = (b: boolean) => (b ? 1 : 0);
