import type { Sequelize } from 'sequelize';
import { hashPassword } from '../server/services/account.service';
import { Group, Membership, Plant, Site, User } from '../server/models';
import { demoGroup, demoPassword, demoPeople, demoPlants, demoSites } from './demo-scenario';

/** Loads the invented demo scenario into an empty database; does nothing once any account exists. */
export async function seedDemo(sequelize: Sequelize): Promise<boolean> {
  if ((await User.count()) > 0) return false;
  const passwordHash = await hashPassword(demoPassword);
  await sequelize.transaction(async (transaction) => {
    const group = await Group.create(demoGroup, { transaction });
    for (const person of demoPeople) {
      const user = await User.create({ email: person.email, name: person.name, passwordHash }, { transaction });
      await Membership.create({ groupId: group.id, userId: user.id, role: person.role }, { transaction });
    }
    const siteIds = new Map<string, string>();
    for (const { key, ...site } of demoSites) {
      const row = await Site.create({ ...site, groupId: group.id, archivedAt: null }, { transaction });
      siteIds.set(key, row.id);
    }
    await Plant.bulkCreate(
      demoPlants.map(({ site, ...plant }) => ({
        rootstock: '',
        healthFlags: [],
        notes: '',
        ...plant,
        siteId: siteIds.get(site)!,
        groupId: group.id,
        archivedAt: null,
      })),
      { transaction },
    );
  });
  return true;
}
