// Every React Query key in one place, so a mutation invalidates exactly what it touched.
export const queryKeys = {
  gardens: () => ["gardens"] as const,
  garden: (gardenId: string) => ["gardens", gardenId] as const,
  members: (gardenId: string) => ["gardens", gardenId, "members"] as const,
  invitations: (gardenId: string) => ["gardens", gardenId, "invitations"] as const,
  outbox: () => ["dev", "outbox"] as const,
};
