// `npm run bench:import`: how long a CSV of daily readings takes to import, on a throw-away
// PostgreSQL cluster (never your own data). Prints figures; asserts nothing.
import { startTestCluster, createMigratedTemplate, TEMPLATE_DATABASE } from '../tests/helpers/test-services';

const test = await startTestCluster();
await createMigratedTemplate(test.cluster);
process.env.DATABASE_URL = test.cluster.url(TEMPLATE_DATABASE);
process.env.LOG_LEVEL = 'silent';

const { addDays } = await import('../server/care');
const { sequelize } = await import('../server/db');
const { Group, Site, SiteReading } = await import('../server/models');
const { importUpload } = await import('../server/services/reading-upload.service');

function csv(years: number): Buffer {
  const lines = ['date,tmin,tmax,rain'];
  for (let i = 0; i < years * 365; i++) {
    const mean = 10 + 7 * Math.sin((2 * Math.PI * (i - 110)) / 365);
    lines.push(`${addDays('2015-01-01', i)},${(mean - 4).toFixed(1)},${(mean + 4).toFixed(1)},${i % 3 ? 0 : 1.2}`);
  }
  return Buffer.from(lines.join('\n'));
}

try {
  const group = await Group.create({ name: 'Bench', kind: 'other' });
  for (const years of [1, 10]) {
    const file = csv(years);
    const times: number[] = [];
    for (let run = 0; run < 5; run++) {
      const site = await Site.create({ groupId: group.id, name: `Bench ${years}/${run}`, latitude: 52, longitude: -1, elevationM: null, timeZone: 'Europe/London', hazards: [], notes: '', archivedAt: null });
      const started = performance.now();
      await importUpload(group.id, site.id, file, { dateOrder: 'auto', onExisting: 'skip' });
      times.push(performance.now() - started);
      if ((await SiteReading.count({ where: { siteId: site.id } })) !== years * 365) throw new Error('rows missing');
    }
    times.sort((a, b) => a - b);
    console.log(`${years * 365} rows (${(file.length / 1024).toFixed(0)} KB): median ${times[2]!.toFixed(0)} ms, best ${times[0]!.toFixed(0)} ms, worst ${times[4]!.toFixed(0)} ms (parse, check, one transaction)`);
  }
} finally {
  await sequelize.close();
  test.remove();
}
