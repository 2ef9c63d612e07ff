/** Whether the database answers, and how fast (for the health endpoint). */
import { db } from '../db/index';

export interface DatabaseStatus {
  database: 'up' | 'down';
  dbLatencyMs: number;
}

export async function databaseStatus(): Promise<DatabaseStatus> {
  const t0 = performance.now();
  let database: DatabaseStatus['database'] = 'up';
  try {
    await db().raw('SELECT 1');
  } catch {
    database = 'down';
  }
  return { database, dbLatencyMs: Math.round((performance.now() - t0) * 10) / 10 };
}
