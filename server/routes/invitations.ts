import { Router } from 'express';
import type { Config } from '../config';
import { actorOf } from '../middleware/authenticate';
import { consumeOrRefuse, type RateLimits } from '../middleware/rate-limit';
import { fitterInvitationBodySchema, idParamsSchema, playerInvitationBodySchema } from '../schemas';
import { inviteFitter, invitePlayer, listFitterInvitations, listPlayerInvitations, resendInvitation, revokeInvitation } from '../services/invitations';
import type { Mailer } from '../services/mailer';
import { Invitation } from '../models';

/** Invitations: the owner's of fitters (under /team), staff's of a player (under /players/:id). */
export function invitationsRouter(config: Config, mailer: Mailer, limits: RateLimits): Router {
  const router = Router();
  const limitMail = async (shopId: string, email: string) => {
    await consumeOrRefuse(limits.invitationsByShop, shopId, 'invitations from your shop');
    await consumeOrRefuse(limits.mailsByRecipient, email, 'messages to that address');
  };

  router.get('/team/invitations', async (_req, res) => {
    res.json(await listFitterInvitations(actorOf(res)));
  });

  router.post('/team/invitations', async (req, res) => {
    const actor = actorOf(res);
    const body = fitterInvitationBodySchema.parse(req.body);
    if (actor.role === 'owner') await limitMail(actor.shopId, body.email);
    res.status(201).json(await inviteFitter(actor, body, config.appUrl, mailer));
  });

  router.get('/players/:id/invitations', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await listPlayerInvitations(actorOf(res), id));
  });

  router.post('/players/:id/invitations', async (req, res) => {
    const actor = actorOf(res);
    const { id } = idParamsSchema.parse(req.params);
    const body = playerInvitationBodySchema.parse(req.body ?? {});
    if (actor.role !== 'player') await consumeOrRefuse(limits.invitationsByShop, actor.shopId, 'invitations from your shop');
    res.status(201).json(await invitePlayer(actor, id, body.email, config.appUrl, mailer));
  });

  router.post('/invitations/:id/resend', async (req, res) => {
    const actor = actorOf(res);
    const { id } = idParamsSchema.parse(req.params);
    const inv = await Invitation.findOne({ where: { id, shopId: actor.shopId }, attributes: ['email'] });
    if (inv && actor.role !== 'player') await limitMail(actor.shopId, inv.email);
    res.json(await resendInvitation(actor, id, config.appUrl, mailer));
  });

  router.delete('/invitations/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    await revokeInvitation(actorOf(res), id);
    res.status(204).end();
  });

  return router;
}
