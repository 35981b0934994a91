import type { EntityManager } from 'typeorm';
import { audit } from '../../audit/audit';
import { conflict, forbidden, notFound } from '../../common/errors';
import { Pairing, PairingReview } from '../../entities';
import { notifyUser } from '../../notifications/notifications.service';

/** A reviewer's decision on a pairing; creation is pairingDef's toColumns/afterWrite in the same folder. */
export type PairingDecision = 'approved' | 'rejected' | 'retired';

/**
 * Approves, rejects or retires a pairing inside the caller's transaction. Approval needs an engineer (or admin)
 * other than the author: four eyes on every combination that reaches a drum. Each decision is kept as a review
 * row, so the history stays, and the author hears of it.
 */
export async function decidePairing(m: EntityManager, id: string, decision: PairingDecision, user: { id: string; displayName: string }, given: string | undefined): Promise<void> {
  const pairing = await m.findOne(Pairing, { where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!pairing) throw notFound('Pairing');
  if (decision !== 'retired' && pairing.status !== 'draft') throw conflict(`Only a draft pairing can be ${decision}; this one is ${pairing.status}.`);
  if (decision === 'retired' && pairing.status === 'retired') throw conflict('This pairing is already retired.');
  if (decision !== 'retired' && pairing.authorId === user.id) throw forbidden('A pairing is reviewed by an engineer other than its author; ask a colleague to review it.');
  if (decision === 'approved') {
    pairing.status = 'approved';
    pairing.approverId = user.id;
    pairing.approvedAt = new Date();
  } else if (decision === 'retired') {
    pairing.status = 'retired';
  }
  pairing.updatedAt = new Date();
  await m.save(pairing);
  const comment = given?.trim() || (decision === 'approved' ? 'Approved.' : '');
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
}
