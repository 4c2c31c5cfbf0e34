import type { Role } from '@/server/schemas';

/** Owners and fitters manage players and fittings; the server checks every request again. */
export const isStaff = (role: Role): boolean => role === 'owner' || role === 'fitter';

/** Only an owner adds, renames or deactivates fitters. */
export const canManageTeam = (role: Role): boolean => role === 'owner';
