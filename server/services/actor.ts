import type { Role } from '../schemas';
import { forbidden } from '../errors';

/** The signed-in user as the services see them. */
export interface Actor {
  id: string;
  role: Role;
  shopId: string;
  /** For a player user: their player profile. */
  playerId: string | null;
  /** Display units of the user (stray reasons and other server-written text). */
  units: 'imperial' | 'metric';
  /** The owner of a closed shop: may only see the shop, reopen it and export it. */
  shopClosed?: boolean;
}

export const isStaff = (actor: Actor) => actor.role === 'owner' || actor.role === 'fitter';

export function requireStaff(actor: Actor): void {
  if (!isStaff(actor)) throw forbidden();
}

export function requireOwner(actor: Actor): void {
  if (actor.role !== 'owner') throw forbidden('Only the shop owner may do that.');
}
