/**
 * The one permission map. The server enforces it on every route (requirePermission); the client
 * only hides what a role cannot use.
 */
export const ROLES = ['owner', 'cutter', 'machinist', 'finisher'] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = [
  'studio:manage',
  'people:manage',
  'styles:read',
  'styles:write',
  'batches:read',
  'batches:write',
  'grading:read',
  'grading:write',
  'fabric:read',
  'fabric:write',
  'markers:read',
  'markers:write',
  'cutplans:write',
  'cutting:work',
  'line:plan',
  'bundles:read',
  'bundles:log',
  'quality:check',
  'progress:read',
  'pay:own',
  'pay:manage',
  'costs:read',
  'costs:write',
  'suppliers:manage',
  'audit:read',
] as const;
export type Permission = (typeof PERMISSIONS)[number];

const FLOOR: Permission[] = ['bundles:log', 'pay:own'];

export const PERMISSION_MAP: Record<Role, readonly Permission[]> = {
  owner: PERMISSIONS,
  // Cutting work without prices or pay.
  cutter: ['styles:read', 'batches:read', 'grading:read', 'fabric:read', 'markers:read', 'cutting:work', 'bundles:read'],
  // Own bundles and own pay only.
  machinist: FLOOR,
  finisher: [...FLOOR, 'quality:check'],
};

/** True when `role` holds `permission`. Unknown roles hold nothing. */
export function can(role: Role | string | undefined, permission: Permission): boolean {
  if (!role || !(role in PERMISSION_MAP)) return false;
  return PERMISSION_MAP[role as Role].includes(permission);
}

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  cutter: 'Cutter',
  machinist: 'Machinist',
  finisher: 'Finisher',
};

/**
 * The operation sections each role may log (and so be paid for): a machinist sews, a finisher finishes
 * and packs, a cutter works the cutting room; the owner may log any section for anyone short-handed.
 */
export const LOG_SECTIONS: Record<Role, readonly ('cutting' | 'sewing' | 'finishing')[]> = {
  owner: ['cutting', 'sewing', 'finishing'],
  cutter: ['cutting'],
  machinist: ['sewing'],
  finisher: ['finishing'],
};

/** True when `role` may log an operation of `section`. Unknown roles log nothing. */
export function canLogSection(role: Role | string | undefined, section: string): boolean {
  if (!role || !(role in LOG_SECTIONS)) return false;
  return (LOG_SECTIONS[role as Role] as readonly string[]).includes(section);
}
