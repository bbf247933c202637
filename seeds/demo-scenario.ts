import type { HealthFlag, PlantForm, PlantTypeCode } from '../server/schemas/catalogue';
import type { Role } from '../server/schemas/group';
import type { SiteHazard } from '../server/schemas/site';

// An invented community orchard: people, places and plants made up for the demo (see README.md).

export const demoPassword = 'orchard-demo';

export const demoGroup = { name: 'Hollin Vale Community Orchard', kind: 'community-orchard' as const };

export const demoPeople: { email: string; name: string; role: Role }[] = [
  { email: 'owner@example.org', name: 'Maren Hollis', role: 'owner' },
  { email: 'grower@example.org', name: 'Tobias Wren', role: 'grower' },
  { email: 'helper@example.org', name: 'Ada Quill', role: 'helper' },
  { email: 'viewer@example.org', name: 'Felix Thorne', role: 'viewer' },
];

interface DemoSite { key: string; name: string; latitude: number; longitude: number; elevationM: number; timeZone: string; hazards: SiteHazard[]; notes: string }

export const demoSites: DemoSite[] = [
  {
    key: 'walled',
    name: 'The Walled Garden',
    latitude: 52.412,
    longitude: -1.874,
    elevationM: 118,
    timeZone: 'Europe/London',
    hazards: ['overhead-lines', 'greenhouse-or-roof'],
    notes: 'South-facing brick wall for the fans and espaliers. The supply line to the bothy crosses the east corner.',
  },
  {
    key: 'plot',
    name: 'Plot 14, Sallow Lane Allotments',
    latitude: 52.398,
    longitude: -1.851,
    elevationM: 104,
    timeZone: 'Europe/London',
    hazards: ['sloping-ground', 'soft-ground'],
    notes: 'Gentle slope to the south-west; clay soil that stays soft after rain. Water trough by the gate.',
  },
];

interface DemoPlant { site: string; typeCode: PlantTypeCode; cultivar: string; rootstock?: string; form: PlantForm; plantedYear: number; heightM: number; positionLabel: string; healthFlags?: HealthFlag[]; notes?: string }

export const demoPlants: DemoPlant[] = [
  { site: 'walled', typeCode: 'apple', cultivar: 'Egremont Russet', rootstock: 'M26', form: 'espalier', plantedYear: 2014, heightM: 1.8, positionLabel: 'South wall, bay 1' },
  { site: 'walled', typeCode: 'apple', cultivar: 'Discovery', rootstock: 'M9', form: 'cordon', plantedYear: 2019, heightM: 2.1, positionLabel: 'South wall, bay 2' },
  { site: 'walled', typeCode: 'apple', cultivar: "Ashmead's Kernel", rootstock: 'MM106', form: 'half-standard', plantedYear: 2008, heightM: 4.2, positionLabel: 'Centre bed, north end', notes: 'Tall: use the tripod ladder and a second person.' },
  { site: 'walled', typeCode: 'pear', cultivar: 'Doyenné du Comice', rootstock: 'Quince A', form: 'espalier', plantedYear: 2012, heightM: 2.2, positionLabel: 'West wall' },
  { site: 'walled', typeCode: 'pear', cultivar: 'Conference', rootstock: 'Quince C', form: 'cordon', plantedYear: 2021, heightM: 1.9, positionLabel: 'West wall, by the door' },
  { site: 'walled', typeCode: 'plum', cultivar: 'Victoria', rootstock: 'St Julien A', form: 'fan', plantedYear: 2016, heightM: 2.4, positionLabel: 'South wall, bay 4', healthFlags: ['silver-leaf'], notes: 'Silver leaf on one arm since last summer: cut only in dry summer weather.' },
  { site: 'walled', typeCode: 'gage', cultivar: 'Cambridge Gage', rootstock: 'St Julien A', form: 'fan', plantedYear: 2017, heightM: 2.3, positionLabel: 'South wall, bay 5' },
  { site: 'walled', typeCode: 'cherry-sour', cultivar: 'Morello', rootstock: 'Colt', form: 'fan', plantedYear: 2015, heightM: 2.5, positionLabel: 'North wall' },
  { site: 'walled', typeCode: 'peach', cultivar: 'Peregrine', rootstock: 'St Julien A', form: 'fan', plantedYear: 2018, heightM: 2.2, positionLabel: 'South wall, bay 3', healthFlags: ['leaf-curl'], notes: 'Rain cover goes on in November.' },
  { site: 'walled', typeCode: 'fig', cultivar: 'Brown Turkey', form: 'fan', plantedYear: 2013, heightM: 2.6, positionLabel: 'Corner by the bothy', notes: 'Roots restricted in a slab-lined pit.' },
  { site: 'walled', typeCode: 'grape-under-cover', cultivar: 'Black Hamburgh', form: 'vine-rod-and-spur', plantedYear: 2010, heightM: 2.4, positionLabel: 'Lean-to glasshouse' },
  { site: 'walled', typeCode: 'grape', cultivar: 'Boskoop Glory', form: 'vine-guyot', plantedYear: 2020, heightM: 1.6, positionLabel: 'South wall wires, east end' },
  { site: 'walled', typeCode: 'redcurrant', cultivar: 'Rovada', form: 'cordon', plantedYear: 2019, heightM: 1.5, positionLabel: 'North wall, low wires' },
  { site: 'plot', typeCode: 'apple', cultivar: "Bramley's Seedling", rootstock: 'MM106', form: 'bush', plantedYear: 2011, heightM: 3.8, positionLabel: 'Top of the plot' },
  { site: 'plot', typeCode: 'apple', cultivar: 'Sunset', rootstock: 'M26', form: 'spindle', plantedYear: 2023, heightM: 1.7, positionLabel: 'Row A, tree 2' },
  { site: 'plot', typeCode: 'plum', cultivar: 'Opal', rootstock: 'Pixy', form: 'pyramid', plantedYear: 2024, heightM: 1.6, positionLabel: 'Row A, tree 3' },
  { site: 'plot', typeCode: 'damson', cultivar: 'Merryweather', rootstock: 'St Julien A', form: 'bush', plantedYear: 2009, heightM: 3.5, positionLabel: 'Hedge line, west', healthFlags: ['dead-wood'] },
  { site: 'plot', typeCode: 'cherry-sweet', cultivar: 'Stella', rootstock: 'Gisela 5', form: 'bush', plantedYear: 2018, heightM: 3.0, positionLabel: 'Row A, tree 1', healthFlags: ['canker'], notes: 'Gummy patch on the main trunk; watch for bacterial canker.' },
  { site: 'plot', typeCode: 'blackcurrant', cultivar: 'Ben Connan', form: 'stool', plantedYear: 2020, heightM: 1.4, positionLabel: 'Bush row, 1–3' },
  { site: 'plot', typeCode: 'whitecurrant', cultivar: 'White Versailles', form: 'bush', plantedYear: 2021, heightM: 1.2, positionLabel: 'Bush row, 4' },
  { site: 'plot', typeCode: 'gooseberry', cultivar: 'Invicta', form: 'bush', plantedYear: 2019, heightM: 1.1, positionLabel: 'Bush row, 5', healthFlags: ['mildew'] },
  { site: 'plot', typeCode: 'gooseberry', cultivar: 'Hinnonmaki Red', form: 'cordon', plantedYear: 2022, heightM: 1.5, positionLabel: 'Fence by the shed' },
  { site: 'plot', typeCode: 'raspberry-summer', cultivar: 'Glen Ample', form: 'cane-row', plantedYear: 2021, heightM: 1.8, positionLabel: 'Cane row, east' },
  { site: 'plot', typeCode: 'raspberry-autumn', cultivar: 'Autumn Bliss', form: 'cane-row', plantedYear: 2020, heightM: 1.5, positionLabel: 'Cane row, west' },
  { site: 'plot', typeCode: 'blackberry', cultivar: 'Loch Ness', form: 'fan', plantedYear: 2017, heightM: 2.0, positionLabel: 'Wires along the north fence' },
  { site: 'plot', typeCode: 'hybrid-berry', cultivar: 'Tayberry', form: 'fan', plantedYear: 2022, heightM: 1.9, positionLabel: 'Wires along the north fence, east' },
  { site: 'plot', typeCode: 'blueberry', cultivar: 'Bluecrop', form: 'bush', plantedYear: 2023, heightM: 1.0, positionLabel: 'Pots of ericaceous compost by the shed' },
];
