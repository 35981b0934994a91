import { pairingEditProblem } from '../../../shared/records/pairing';
import { fieldError } from '../../common/errors';
import { Connector, DipTube, Pairing, PairingReview } from '../../entities';
import { PAIRING_STATUSES } from '../../entities/registry';
import { notifyRoles } from '../../notifications/notifications.service';
import { byCode, filter, stamps } from '../common';
import { oneOf } from '../list-query';
import { ensureExists, pick } from '../refs';
import { PairingDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import type { PairingRecord } from '../../../shared/contract/records';
import { copyOf, nameOf, type Sent } from '../../common/json';

export const pairingJson = (p: Pairing): Sent<PairingRecord> => ({
  ...stamps(p),
  ...copyOf(p, ['dipTubeId', 'connectorId', 'status', 'authorId', 'approverId', 'approvedAt', 'notes']),
  dipTubePartNumber: p.dipTube?.partNumber ?? null,
  threadCode: p.dipTube?.threadSpec?.code ?? null,
  connectorPartNumber: p.connector?.partNumber ?? null,
  authorName: nameOf(p.author),
  approverName: nameOf(p.approver),
});

export const pairingDef: ResourceDef<Pairing> = {
  path: 'pairings',
  label: 'Pairing',
  entity: Pairing,
  alias: 'p',
  dto: PairingDto,
  joins: (qb) =>
    qb
      .leftJoinAndSelect('p.dipTube', 'pt')
      .leftJoinAndSelect('pt.threadSpec', 'ptt')
      .leftJoinAndSelect('pt.keyCode', 'ptk')
      .leftJoinAndSelect('p.connector', 'pc')
      .leftJoinAndSelect('p.author', 'pa')
      .leftJoinAndSelect('p.approver', 'pv'),
  search: ['pt.part_number', 'pc.part_number', "coalesce(p.notes, '')"],
  sorts: { status: 'p.status', updatedAt: 'p.updatedAt', dipTube: 'pt.partNumber', connector: 'pc.partNumber' },
  defaultSort: 'updatedAt',
  filters: {
    status: filter(oneOf(PAIRING_STATUSES), (qb, v) => qb.andWhere('p.status = :status', { status: v })),
    thread: byCode('thread', 'ptt'),
    key: byCode('key', 'ptk'),
  },
  toJson: pairingJson,
  toColumns: async (dto, { manager, user, existing }) => {
    if (existing) {
      const problem = pairingEditProblem(dto);
      if (problem) throw fieldError(problem.field, problem.says);
      return pick<Pairing>(dto, ['notes']);
    }
    await ensureExists(manager, DipTube, dto.dipTubeId, 'dipTubeId', 'dip tube');
    await ensureExists(manager, Connector, dto.connectorId, 'connectorId', 'connector');
    return { ...pick<Pairing>(dto, ['dipTubeId', 'connectorId', 'notes']), status: 'draft', authorId: user.id, approverId: null, approvedAt: null };
  },
  // A new draft asks the other engineers for a review (in the same transaction as the pairing).
  afterWrite: async (p, _dto, { manager, user, existing }) => {
    if (existing) return;
    const full = await manager.findOne(Pairing, { where: { id: p.id }, relations: { dipTube: true, connector: true } });
    const what = `${full?.dipTube?.partNumber} with ${full?.connector?.partNumber}`;
    await notifyRoles(
      manager,
      ['engineer'],
      {
        kind: 'pairing-review',
        title: `Pairing ${what} awaits review`,
        body: `${user.displayName} registered the pairing of ${what}; an engineer other than the author approves or rejects it.`,
        link: `/registry/pairings/${p.id}`,
      },
      user.id,
    );
  },
  detailExtras: async (p, m): Promise<Sent<Required<Pick<PairingRecord, 'reviews'>>>> => ({
    reviews: (await m.find(PairingReview, { where: { pairingId: p.id }, relations: { reviewer: true }, order: { createdAt: 'ASC' } })).map((r) => ({
      ...copyOf(r, ['id', 'decision', 'comment', 'reviewerId']),
      reviewerName: nameOf(r.reviewer),
      at: r.createdAt,
    })),
  }),
};
