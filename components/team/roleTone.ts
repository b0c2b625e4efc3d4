import type { BadgeTone } from '@/components/ui';
import type { Role } from '@/shared/roles';

/** Badge tint per role; the role's name is always written out, the tint only helps scanning a list. */
export const roleTone: Record<Role, BadgeTone> = {
  admin: 'copper',
  designer: 'primary',
  reviewer: 'info',
  installer: 'neutral',
};
