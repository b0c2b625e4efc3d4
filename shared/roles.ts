/** The four team roles (product brief) and what each may do (docs/api.md role table). */
export const ROLES = ['admin', 'designer', 'reviewer', 'installer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  designer: 'Designer',
  reviewer: 'Reviewer',
  installer: 'Installer',
};

/** Capabilities checked by the server's role guard and used by the client to hide what a role cannot do. */
export const CAPABILITIES = {
  readAllVersions: ['admin', 'designer', 'reviewer'],
  readApprovedVersions: ['admin', 'designer', 'reviewer', 'installer'],
  editDesigns: ['admin', 'designer'],
  review: ['admin', 'reviewer'],
  manageTeam: ['admin'],
  /** Site work: mark cables and bring-up steps, attach photos (approved versions only). */
  markBuild: ['admin', 'installer'],
  /** CHAP secrets: make (or remake) them, and be shown them (each showing recorded). */
  generateSecrets: ['admin', 'designer'],
  revealSecrets: ['admin', 'installer'],
} as const satisfies Record<string, readonly Role[]>;
export type Capability = keyof typeof CAPABILITIES;

export function can(role: Role, capability: Capability): boolean {
  return (CAPABILITIES[capability] as readonly Role[]).includes(role);
}
