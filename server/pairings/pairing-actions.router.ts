import { secured } from '../auth/policy';
import { Router, type Request, type Response } from 'express';
import type { DataSource } from 'typeorm';
import { parseDto } from '../common/validate';
import type { Pairing } from '../entities';
import { decidePairing, type PairingDecision } from '../registry/pairings/pairing.service';
import { ResourceService, parseId } from '../registry/resource';
import { RequiredCommentDto, ReviewDto } from '../registry/registry.dto';

/** Review actions on a pairing: the rules live in server/registry/pairings/pairing.service.ts. */
export function pairingActionsRouter(ds: DataSource, pairings: ResourceService<Pairing>): Router {
  const router = Router();
  const r = secured(router);

  const decide = (decision: PairingDecision) => async (req: Request, res: Response) => {
    const id = parseId(req.params.id);
    const body = decision === 'approved' ? await parseDto(ReviewDto, req.body ?? {}) : await parseDto(RequiredCommentDto, req.body ?? {});
    await ds.transaction((m) => decidePairing(m, id, decision, req.user!, body.comment));
    res.json(await pairings.detail(id));
  };

  r.post('/pairings/:id/approve', decide('approved'));
  r.post('/pairings/:id/reject', decide('rejected'));
  r.post('/pairings/:id/retire', decide('retired'));
  return router;
}
