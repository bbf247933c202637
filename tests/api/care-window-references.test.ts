import { QueryTypes } from 'sequelize';
import { beforeEach, describe, expect, it } from 'vitest';
import { CareWindow, User } from '../../server/models';
import { createPlant, resetDatabase, roleFixture } from '../helpers/api';
import { windowFor } from '../helpers/log';

// care_windows has no foreign keys (the daily pass writes hundreds of thousands of rows at once);
// triggers keep what the keys kept: a deleted plant takes its windows, a deleted person leaves none
// of their marks behind.

beforeEach(resetDatabase);

describe('care windows without foreign keys', () => {
  it('go with their plant when it is deleted, and no other plant\'s do', async () => {
    const f = await roleFixture();
    const other = await createPlant(f.group, f.site);
    await windowFor(f.plant, 'winter-prune', '2026-11-01', '2027-02-28');
    await windowFor(f.plant, 'spring-feed', '2027-03-01', '2027-04-15');
    const kept = await windowFor(other, 'winter-prune', '2026-11-01', '2027-02-28');
    await f.plant.destroy();
    expect((await CareWindow.findAll()).map((w) => w.id)).toEqual([kept.id]);
  });

  it('lose who did them and who had them when that person is deleted', async () => {
    const f = await roleFixture();
    const window = await windowFor(f.plant, 'winter-prune', '2026-11-01', '2027-02-28');
    await CareWindow.sequelize!.query('UPDATE care_windows SET done_by = $1, assigned_to = $1, assigned_by = $2, done_at = now() WHERE id = $3', {
      bind: [f.people.helper.id, f.people.owner.id, window.id],
    });
    await User.destroy({ where: { id: f.people.helper.id } });
    const [row] = await CareWindow.sequelize!.query<{ done_by: string | null; assigned_to: string | null; assigned_by: string | null }>(
      'SELECT done_by, assigned_to, assigned_by FROM care_windows WHERE id = $1', { bind: [window.id], type: QueryTypes.SELECT },
    );
    expect(row).toEqual({ done_by: null, assigned_to: null, assigned_by: f.people.owner.id });
  });
});
