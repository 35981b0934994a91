import type { DataSource, EntityManager } from 'typeorm';
import { hashPassword } from '../server/auth/passwords';
import { passwordProblem } from '../shared/passwords';
import { SiteSettings, User } from '../server/entities';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_SITE_NAME } from './people';
import { seedDemoRegistry } from './demo-registry';
import { ensureReferenceData } from './reference';

export interface SeedOptions {
  demo: boolean;
  adminEmail?: string;
  adminPassword?: string;
}

async function seedPeople(m: EntityManager): Promise<Record<string, string>> {
  const hash = await hashPassword(DEMO_PASSWORD);
  const ids: Record<string, string> = {};
  for (const p of DEMO_PEOPLE) {
    const user = await m.save(m.create(User, { email: p.email, displayName: p.name, role: p.role, passwordHash: hash, active: true }));
    ids[p.email] = user.id;
  }
  return ids;
}

/** Loads the demo scenario (or, with demo off, only the first admin) when the database holds no users. */
export async function seedIfEmpty(ds: DataSource, options: SeedOptions): Promise<'seeded' | 'kept'> {
  return ds.transaction(async (m) => {
    await ensureReferenceData(m);
    if ((await m.count(User)) > 0) return 'kept';
    if (options.demo) {
      await m.save(m.create(SiteSettings, { siteName: DEMO_SITE_NAME }));
      const ids = await seedPeople(m);
      await seedDemoRegistry(m, {
        engineerId: ids['engineer@bungwise.example'],
        engineer2Id: ids['engineer2@bungwise.example'],
        clerkId: ids['clerk@bungwise.example'],
      });
      return 'seeded';
    }
    const email = options.adminEmail?.trim().toLowerCase();
    const password = options.adminPassword ?? '';
    if (!email || !password) {
      throw new Error('With BUNGWISE_DEMO=0 the first administrator comes from BUNGWISE_ADMIN_EMAIL and BUNGWISE_ADMIN_PASSWORD: set both.');
    }
    const problem = passwordProblem(password);
    if (problem) throw new Error(`BUNGWISE_ADMIN_PASSWORD ${problem}.`);
    await m.save(m.create(SiteSettings, { siteName: 'Our site' }));
    await m.save(m.create(User, { email, displayName: 'Administrator', role: 'admin', passwordHash: await hashPassword(password), active: true }));
    return 'seeded';
  });
}
