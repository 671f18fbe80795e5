import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import { Studio } from '../../studios/entities/studio.entity';
import { User } from '../../users/entities/user.entity';
import { demoPassword, demoStudio, demoUsers } from './demo-data';

export interface SeedSummary {
  studios: number;
  usersCreated: number;
  usersKept: number;
}

/**
 * Loads the demo scenario. Idempotent: what exists (matched by e-mail or studio name) is kept as
 * it is, so a second start never duplicates or overwrites what people changed in the demo.
 */
export async function seedDemo(dataSource: DataSource): Promise<SeedSummary> {
  return dataSource.transaction(async (manager) => {
    const studios = manager.getRepository(Studio);
    const users = manager.getRepository(User);
    let studio = await studios.findOneBy({ name: demoStudio.name });
    if (!studio) studio = await studios.save(studios.create(demoStudio));

    const passwordHash = await bcrypt.hash(demoPassword, 10);
    let usersCreated = 0;
    let usersKept = 0;
    for (const demo of demoUsers) {
      const existing = await users.findOneBy({ email: demo.email });
      if (existing) {
        usersKept += 1;
        continue;
      }
      await users.save(
        users.create({
          email: demo.email,
          displayName: demo.displayName,
          role: demo.role,
          passwordHash,
          studioId: demo.inStudio ? studio.id : null,
        }),
      );
      usersCreated += 1;
    }
    return { studios: 1, usersCreated, usersKept };
  });
}
