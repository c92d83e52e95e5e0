// "Hollis Street Garden": invented demo data (PRODUCT.md demo scenario).
// Sizes are entered the way a grower measures them (inches, feet, gallons) and
// converted to SI with exact NIST HB 44 factors.

const IN = 0.0254; // m, exact
const FT = 0.3048; // m, exact
const GAL = 3.785411784; // L, exact

export const demoPasswordHint = "Demo accounts (password for each shown beside it)";

export const demoMembers = [
  {
    email: "maren@example.com",
    name: "Maren Okafor",
    role: "owner",
    password: "hollis-owner-2026",
  },
  {
    email: "theo@example.com",
    name: "Theo Lindqvist",
    role: "grower",
    password: "compost-grower-2026",
  },
  { email: "priya@example.com", name: "Priya Ramos", role: "helper", password: "leaf-helper-2026" },
  {
    email: "sam@example.com",
    name: "Sam Whitcombe",
    role: "viewer",
    password: "frost-viewer-2026",
  },
] as const;

export const demoGarden = {
  name: "Hollis Street Garden",
  timeZone: "America/Chicago",
  unitSystem: "us" as const,
  lastSpringFrost: "2026-04-22",
  firstFallFrost: "2026-10-18",
  location: "Back plot, next to the Hollis Street community beds",
};

// The community-garden neighbour: Maren also grows there, so the garden
// switcher has somewhere to go. Its owner has no published demo password.
export const neighbourGarden = {
  garden: {
    name: "Linden Row community beds",
    timeZone: "America/Chicago",
    unitSystem: "us" as const,
    lastSpringFrost: "2026-04-22",
    firstFallFrost: "2026-10-18",
    location: "Shared plots across the alley from Hollis Street",
  },
  owner: { email: "jun@example.com", name: "Jun Park" },
  memberRoles: { owner: "grower", grower: "helper" } as const,
  beds: [
    { name: "Plot 3", kind: "bed" as const, lengthM: 10 * FT, widthM: 4 * FT, depthM: 8 * IN },
    { name: "Plot 4", kind: "bed" as const, lengthM: 10 * FT, widthM: 4 * FT, depthM: 8 * IN },
  ],
};

export const demoBins = {
  stack: {
    name: "Cedar stack",
    kind: "stacked-tray" as const,
    // Built 24 × 20 in outside from 2×6 boards: 21 × 17 × 5½ in inside (PS 20 dry sizes).
    trayLengthM: 21 * IN,
    trayWidthM: 17 * IN,
    trayDepthM: 5.5 * IN,
    trayCount: 4,
    startedOn: "2026-02-07",
    indoors: false,
    dormantMonths: [1],
    manureFeedstock: false,
    startingWormCount: 1500,
    leachateEstimateLPerWeek: 0.4,
  },
  tote: {
    name: "Porch tote",
    kind: "stacked-tray" as const,
    trayLengthM: 16 * IN,
    trayWidthM: 12 * IN,
    trayDepthM: 6 * IN,
    trayCount: 2,
    startedOn: "2026-06-14",
    indoors: true,
    dormantMonths: [] as number[],
    // Fed some rabbit manure: its outputs carry the 90/120-day pre-harvest interval.
    manureFeedstock: true,
    startingWormCount: 400,
    leachateEstimateLPerWeek: 0.15,
  },
};

type BedSeed = {
  key: string;
  name: string;
  kind: "bed" | "container";
  indoors?: boolean;
  lengthM?: number;
  widthM?: number;
  depthM?: number;
  containerVolumeL?: number;
};

export const demoBeds: BedSeed[] = [
  {
    key: "north",
    name: "North raised bed",
    kind: "bed",
    lengthM: 8 * FT,
    widthM: 4 * FT,
    depthM: 11 * IN,
  },
  {
    key: "south",
    name: "South raised bed",
    kind: "bed",
    lengthM: 8 * FT,
    widthM: 4 * FT,
    depthM: 11 * IN,
  },
  {
    key: "berry",
    name: "Berry bed",
    kind: "bed",
    lengthM: 10 * FT,
    widthM: 3 * FT,
    depthM: 8 * IN,
  },
  { key: "herb", name: "Herb strip", kind: "bed", lengthM: 6 * FT, widthM: 2 * FT, depthM: 8 * IN },
  { key: "pot-blue", name: "Blueberry barrel", kind: "container", containerVolumeL: 15 * GAL },
  { key: "pot-pepper", name: "Pepper pot", kind: "container", containerVolumeL: 5 * GAL },
  { key: "pot-potato", name: "Potato grow bag", kind: "container", containerVolumeL: 10 * GAL },
  { key: "pot-dahlia", name: "Dahlia tub", kind: "container", containerVolumeL: 7 * GAL },
  { key: "pot-zinnia", name: "Zinnia trough", kind: "container", containerVolumeL: 5 * GAL },
  {
    key: "pot-basil",
    name: "Kitchen window basil",
    kind: "container",
    indoors: true,
    containerVolumeL: 1 * GAL,
  },
];

type PlantingSeed = {
  bed: string;
  crop: string;
  count: number;
  plantedOn: string;
  expectedHarvestOn?: string;
  endedOn?: string;
  priority: number;
};

export const demoPlantings: PlantingSeed[] = [
  // Last season, finished: they carry the logged top-dressings.
  {
    bed: "north",
    crop: "Tomato",
    count: 6,
    plantedOn: "2026-05-09",
    expectedHarvestOn: "2026-08-01",
    endedOn: "2026-10-12",
    priority: 1,
  },
  {
    bed: "north",
    crop: "Pepper",
    count: 4,
    plantedOn: "2026-05-09",
    expectedHarvestOn: "2026-08-10",
    endedOn: "2026-10-12",
    priority: 2,
  },
  {
    bed: "south",
    crop: "Squash",
    count: 3,
    plantedOn: "2026-05-16",
    expectedHarvestOn: "2026-07-20",
    endedOn: "2026-09-30",
    priority: 2,
  },
  // Perennials and overwintering crops.
  {
    bed: "berry",
    crop: "Strawberry",
    count: 12,
    plantedOn: "2026-04-25",
    expectedHarvestOn: "2027-06-01",
    priority: 2,
  },
  {
    bed: "pot-blue",
    crop: "Blueberry",
    count: 1,
    plantedOn: "2026-04-25",
    expectedHarvestOn: "2027-07-01",
    priority: 3,
  },
  {
    bed: "herb",
    crop: "Garlic",
    count: 24,
    plantedOn: "2026-10-20",
    expectedHarvestOn: "2027-07-10",
    priority: 4,
  },
  { bed: "herb", crop: "Thyme", count: 3, plantedOn: "2026-05-01", priority: 5 },
  { bed: "pot-basil", crop: "Basil", count: 2, plantedOn: "2026-11-01", priority: 4 },
  // Next season's plan.
  {
    bed: "north",
    crop: "Tomato",
    count: 6,
    plantedOn: "2027-05-08",
    expectedHarvestOn: "2027-08-01",
    priority: 1,
  },
  {
    bed: "north",
    crop: "Pepper",
    count: 4,
    plantedOn: "2027-05-08",
    expectedHarvestOn: "2027-08-10",
    priority: 2,
  },
  {
    bed: "south",
    crop: "Kale",
    count: 8,
    plantedOn: "2027-04-10",
    expectedHarvestOn: "2027-06-01",
    priority: 3,
  },
  {
    bed: "south",
    crop: "Cucumber",
    count: 4,
    plantedOn: "2027-05-20",
    expectedHarvestOn: "2027-07-25",
    priority: 2,
  },
  {
    bed: "pot-pepper",
    crop: "Pepper",
    count: 1,
    plantedOn: "2027-05-08",
    expectedHarvestOn: "2027-08-10",
    priority: 2,
  },
  {
    bed: "pot-potato",
    crop: "Potato",
    count: 3,
    plantedOn: "2027-04-15",
    expectedHarvestOn: "2027-07-30",
    priority: 3,
  },
  { bed: "pot-dahlia", crop: "Dahlia", count: 1, plantedOn: "2027-05-15", priority: 4 },
  { bed: "pot-zinnia", crop: "Zinnia", count: 6, plantedOn: "2027-05-25", priority: 5 },
];

/** Three months of bin work (September–November 2026). */
export const demoLogWindow = { from: "2026-09-01", to: "2026-11-30" };

// Logged harvests: what the scale said (kg), roughly 90 % of the geometric forecast.
export const demoHarvests = [
  { bin: "stack", on: "2026-09-05", castingsKg: 18.6 },
  { bin: "stack", on: "2026-10-05", castingsKg: 19.4 },
  { bin: "tote", on: "2026-09-12", castingsKg: 10.7 },
  { bin: "stack", on: "2026-11-04", castingsKg: 17.9 },
  { bin: "tote", on: "2026-10-27", castingsKg: 11.2 },
];

export const demoWormMove = { from: "stack", to: "tote", on: "2026-06-14", wormCount: 400 };
