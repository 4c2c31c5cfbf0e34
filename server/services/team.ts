import type { z } from 'zod';
import { HttpError, notFound } from '../errors';
import { User } from '../models';
import type { TeamMember, teamMemberUpdateSchema } from '../schemas';
import { type Actor, requireOwner, requireStaff } from './actor';
import { assertStrongPassword } from './password-strength';
import { hashPassword } from './passwords';

const toMember = (u: User): TeamMember => ({
  id: u.id,
  name: u.name,
  email: u.email,
  role: u.role === 'owner' ? 'owner' : 'fitter',
  active: u.active,
});

export async function listTeam(actor: Actor): Promise<TeamMember[]> {
  requireStaff(actor);
  const users = await User.findAll({ where: { shopId: actor.shopId, role: ['owner', 'fitter'] }, order: [['role', 'DESC'], ['name', 'ASC']] });
  return users.map(toMember);
}

export async function updateFitter(actor: Actor, id: string, body: z.output<typeof teamMemberUpdateSchema>): Promise<TeamMember> {
  requireOwner(actor);
  const user = await User.findOne({ where: { id, shopId: actor.shopId, role: 'fitter' } });
  if (!user) throw notFound('That fitter');
  if (body.name !== undefined) user.name = body.name;
  if (body.active !== undefined && body.active !== user.active) {
    user.active = body.active;
    if (!body.active) user.tokenVersion = user.tokenVersion + 1; // ends their sessions
  }
  await user.save();
  return toMember(user);
}
