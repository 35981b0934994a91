import { secured } from '../auth/policy';
import { Router, type Request, type Response } from 'express';
import type { DataSource } from 'typeorm';
import { conflict, forbidden, notFound } from '../common/errors';
import { parseDto } from '../common/validate';
import { Pairing, PairingReview } from '../entities';
import { notifyUser } from '../notifications/notifications.service';
import { audit } from '../audit/audit';
import { ResourceService, parseId } from '../registry/resource';
import { RequiredCommentDto, ReviewDto } from '../registry/registry.dto';

type Decision = 'approved' | 'rejected' | 'retired';

/**
 * Review actions on a pairing. Approval needs an engineer (or admin) other than the author: four eyes on
 * every combination that reaches a drum. Each decision is kept as a review row, so the history stays.
 */
export function pairingActionsRouter(ds: DataSource, pairings: ResourceService<Pairing>): Router {
  const router = Router();
  const r = secured(router);

  const decide = (decision: Decision) => async (req: Request, res: Response) => {
    const id = parseId(req.params.id);
    const body = decision === 'approved' ? await parseDto(ReviewDto, req.body ?? {}) : await parseDto(RequiredCommentDto, req.body ?? {});
    const user = req.user!;
    await ds.transaction(async (m) => {
      const pairing = await m.findOne(Pairing, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!pairing) throw notFound('Pairing');
      if (decision !== 'retired' && pairing.status !== 'draft') {
        throw conflict(`Only a draft pairing can be ${decision}; this one is ${pairing.status}.`);
      }
      if (decision === 'retired' && pairing.status === 'retired') throw conflict('This pairing is already retired.');
      if (decision !== 'retired' && pairing.authorId === user.id) {
        throw forbidden('A pairing is reviewed by an engineer other than its author; ask a colleague to review it.');
      }
      if (decision === 'approved') {
        pairing.status = 'approved';
        pairing.approverId = user.id;
        pairing.approvedAt = new Date();
      } else if (decision === 'retired') {
        pairing.status = 'retired';
      }
      pairing.updatedAt = new Date();
      await m.save(pairing);
      const comment = body.comment?.trim() || (decision === 'approved' ? 'Approved.' : '');
      await audit(m, {
        userId: user.id,
        action: decision === 'approved' ? 'approve' : decision === 'rejected' ? 'reject' : 'retire',
        entity: 'pairings',
        entityId: id,
        summary: `Pairing ${decision}: ${comment}`,
        after: { status: pairing.status, comment },
      });
      await m.save(m.create(PairingReview, { pairingId: id, reviewerId: user.id, decision, comment }));
      if (decision !== 'retired' && pairing.authorId !== user.id) {
        const full = await m.findOne(Pairing, { where: { id }, relations: { dipTube: true, connector: true } });
        const what = `${full?.dipTube?.partNumber} with ${full?.connector?.partNumber}`;
        await notifyUser(m, pairing.authorId, {
          kind: 'pairing-decision',
          title: `Pairing ${what} ${decision}`,
          body: `${user.displayName} ${decision} your pairing of ${what}: ${comment}`,
          link: `/registry/pairings/${id}`,
        });
      }
    });
    res.json(await pairings.detail(id));
  };

  r.post('/pairings/:id/approve', decide('approved'));
  r.post('/pairings/:id/reject', decide('rejected'));
  r.post('/pairings/:id/retire', decide('retired'));
  return router;
}
