import type { Database } from './db/database';
import type { Role } from './db/models/user';
import { loadDemoDesigns } from './domainBridge';
import { createPasswords, DEFAULT_PASSWORD_COST } from './modules/auth/passwords';
import { createDesignsService } from './modules/designs/service';

/** The invented demo shop, Harbor Lane Fabrication. Every account shares one demo password. */
export const DEMO_PASSWORD = 'slotwise-demo-2026';
export const DEMO_ACCOUNTS: { email: string; displayName: string; role: Role }[] = [
  { email: 'owner@harborlane.example', displayName: 'Noor Okafor', role: 'owner' },
  { email: 'designer@harborlane.example', displayName: 'Tomasz Reyes', role: 'designer' },
  { email: 'builder@harborlane.example', displayName: 'Ines Varga', role: 'builder' },
  { email: 'customer@harborlane.example', displayName: 'Priya Lindqvist', role: 'customer' },
  { email: 'instructor@harborlane.example', displayName: 'Malik Osei', role: 'instructor' },
];

export interface SeedReport {
  usersCreated: number;
  designsCreated: number;
}

/** Adds whatever part of the demo shop is missing; running it twice changes nothing. */
export async function seedDemo(db: Database, options: { passwordCost?: number } = {}): Promise<SeedReport> {
  const { User, Design } = db.models;
  const passwords = createPasswords(options.passwordCost ?? DEFAULT_PASSWORD_COST);
  const passwordHash = await passwords.hash(DEMO_PASSWORD);

  let usersCreated = 0;
  await db.write(async (transaction) => {
    for (const account of DEMO_ACCOUNTS) {
      const existing = await User.findOne({ where: { email: account.email }, transaction });
      if (existing) continue;
      await User.create({ ...account, passwordHash, preferences: { units: 'mm' } }, { transaction });
      usersCreated += 1;
    }
  });

  const designer = await User.findOne({ where: { email: 'designer@harborlane.example' } });
  const designs = await loadDemoDesigns();
  let designsCreated = 0;
  if (designer) {
    const service = createDesignsService(db);
    for (const document of designs) {
      const existing = await Design.findOne({ where: { name: document.name, createdBy: designer.id } });
      if (existing) continue;
      await service.create(designer, document, { message: 'Demo design' });
      designsCreated += 1;
    }
  }
  return { usersCreated, designsCreated };
}
