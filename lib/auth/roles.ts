// Roles are per garden and ordered: each may do everything the ones below may.
export const roles = ["viewer", "helper", "grower", "owner"] as const;
export type Role = (typeof roles)[number];

export function roleAtLeast(role: Role, minimum: Role): boolean {
  return roles.indexOf(role) >= roles.indexOf(minimum);
}

export const roleLabels: Record<Role, string> = {
  owner: "Owner",
  grower: "Grower",
  helper: "Helper",
  viewer: "Viewer",
};

export const roleDescriptions: Record<Role, string> = {
  owner: "Everything, including members, roles and deleting the garden",
  grower: "Plans beds, plantings, bins and feeding rules; logs anything",
  helper: "Logs feedings and bin work on the day; sees the plan",
  viewer: "Reads the plan and the logs; changes nothing",
};
