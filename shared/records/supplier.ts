// One home for a supplier's limits, read by the API's DTO (server/registry/registry.dto.ts). A supplier has no
// rule across its fields.
export const SUPPLIER_LIMITS = {
  nameChars: 120,
  notesChars: 2000,
} as const;
