// "Hollis Street Garden": invented demo data (PRODUCT.md demo scenario). The
// gardens themselves are scenario files, imported by the same path as any
// garden file (db/queries/garden-scenario.ts); this module adds the people.
import hollisStreet from "@/tests/fixtures/scenarios/hollis-street-garden.json";
import lindenRow from "@/tests/fixtures/scenarios/linden-row-community-beds.json";

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
  scenario: hollisStreet as unknown,
  name: hollisStreet.garden.name,
  location: "Back plot, next to the Hollis Street community beds",
};

// The community-garden neighbour: Maren also grows there, so the garden
// switcher has somewhere to go. Its owner has no published demo password.
export const neighbourGarden = {
  scenario: lindenRow as unknown,
  name: lindenRow.garden.name,
  location: "Shared plots across the alley from Hollis Street",
  owner: { email: "jun@example.com", name: "Jun Park" },
  memberRoles: { owner: "grower", grower: "helper" } as const,
};
