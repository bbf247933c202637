// The local weather-station fake as its own process, for `npm start` (STATION_FAKE_PORT, default 8089).
import { startStationFake } from './lib/station-fake';

const port = Number(process.env.STATION_FAKE_PORT ?? 8089);
const fake = await startStationFake({ port });
console.log(`[station] invented weather-station service on ${fake.url}`);

const stop = () => void fake.close().then(() => process.exit(0));
process.once('SIGINT', stop);
process.once('SIGTERM', stop);
