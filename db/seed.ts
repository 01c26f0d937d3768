/** Idempotent demo seed: run it any number of times, nothing is duplicated or overwritten. */
import { eq } from 'drizzle-orm';
import { hashPassword } from '../server/lib/auth/passwords';
import { loadConfig } from '../server/lib/config';
import { createDatabase } from './index';
import { organizations, users } from './schema';
import { seedPriceBook } from './seed-price-book';
import { seedQuotes } from './seed-quotes';
import { DEMO_PASSWORD, demoOrganizations, demoUsers } from './seed-data';

const { DATABASE_URL } = loadConfig();
const { db, pool } = createDatabase(DATABASE_URL, 2);
try {
  await db.insert(organizations).values([...demoOrganizations]).onConflictDoNothing({ target: organizations.name });
  const orgIds = new Map((await db.select().from(organizations)).map((o) => [o.name, o.id]));
  const existing = new Set((await db.select({ email: users.email }).from(users)).map((u) => u.email));
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  let added = 0;
  for (const u of demoUsers.filter((d) => !existing.has(d.email))) {
    const organizationId = orgIds.get(u.organization);
    if (!organizationId) throw new Error(`seed: organisation ${u.organization} missing`);
    await db.insert(users).values({ email: u.email, name: u.name, role: u.role, organizationId, passwordHash }).onConflictDoNothing();
    added++;
  }
  const bookVersion = await seedPriceBook(db);
  const quotesAdded = await seedQuotes(db);
  const [fab] = await db.select().from(organizations).where(eq(organizations.kind, 'fabricator'));
  console.log(`[seed] demo data ready (${added} users, ${quotesAdded} quotes added${bookVersion ? `, price book v${bookVersion}` : ''}; fabricator ${fab?.name})`);
} finally {
  await pool.end();
}
