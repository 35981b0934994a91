import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { computePortFlow } from '../../shared/flow';
import { checkDrumPackagingCode } from '../../shared/packaging-code';
import { readPackagingMark } from '../../shared/packaging-mark';
import { recommendDipTubeLength } from '../../shared/recommend-length';
import { identifyThread } from '../../shared/threads/identify';
import { flowToM3s, fromM3s, toMm, type FlowUnit, type LengthUnit } from '../../shared/units';
import { badRequest, fieldError } from '../common/errors';
import { body } from '../common/validate';
import { DrumType, ThreadSpec } from '../entities';
import { threadRow } from '../registry/thread-specs/thread-spec.def';
import { parseId } from '../registry/resource';
import { fitSettingsOf, loadSettings } from '../settings/settings.service';
import { FlowDto, ThreadMatchDto } from './tools.dto';
import type { DrumTypeChecks, FlowAnswer, PackagingCodeAnswer } from '../../shared/contract/tools';

/** The calculators. They only read, so every signed-in role may use them. */
export function toolsRouter(ds: DataSource): Router {
  const router = Router();
  const r = secured(router);

  r.post('/tools/thread-match', body(ThreadMatchDto), async (req, res) => {
    const dto = req.body as ThreadMatchDto;
    const settings = fitSettingsOf(await loadSettings(ds.manager));
    // Matched against the site's thread table (the published rows plus any an engineer added).
    const table = (await ds.manager.find(ThreadSpec)).map(threadRow);
    const result = identifyThread(
      {
        majorDiameterMm: toMm(dto.majorDiameter.value, dto.majorDiameter.unit as LengthUnit),
        ...(dto.pitchMm !== undefined ? { pitchMm: dto.pitchMm } : {}),
        ...(dto.threadsPerInch !== undefined ? { threadsPerInch: dto.threadsPerInch } : {}),
        ...(dto.flankAngleDeg !== undefined ? { flankAngleDeg: dto.flankAngleDeg } : {}),
        ...(dto.taper !== undefined ? { taper: dto.taper } : {}),
        ...(dto.side !== undefined ? { side: dto.side } : {}),
      },
      table,
      { diameterToleranceMm: settings.threadMatchToleranceMm },
    );
    res.json(result);
  });

  r.post('/tools/flow', body(FlowDto), async (req, res) => {
    const dto = req.body as FlowDto;
    const settings = fitSettingsOf(await loadSettings(ds.manager));
    const flowM3s = flowToM3s(dto.flow.value, dto.flow.unit as FlowUnit);
    const result = computePortFlow({ flowM3s, feedBoreMm: dto.feedBoreMm, returnBoreMm: dto.returnBoreMm ?? null, laminarLimit: settings.laminarLimit });
    res.json({
      ...result,
      flow: { value: dto.flow.value, unit: dto.flow.unit as FlowUnit },
      flowGpm: fromM3s(flowM3s, 'gal/min'),
      flowM3h: fromM3s(flowM3s, 'm3/h'),
      laminarLimit: settings.laminarLimit,
    } satisfies FlowAnswer);
  });

  r.get('/tools/packaging-codes/:code', async (req, res) => {
    // A code alone (1A1) or a whole mark (UN 1A1/Y1.4/150/24/NL/VL824, slashes URL-encoded).
    const read = readPackagingMark(String(req.params.code));
    if (!read.ok) throw badRequest('invalid_packaging_code', read.error, [{ field: 'code', messages: [read.error] }]);
    res.json({ ...read.code, mark: read.mark } satisfies PackagingCodeAnswer);
  });

  r.get('/tools/drum-types/:id/checks', async (req, res) => {
    const drum = await ds.manager.findOneBy(DrumType, { id: parseId(req.params.id) });
    if (!drum) throw fieldError('id', 'does not name an existing drum type');
    const settings = fitSettingsOf(await loadSettings(ds.manager));
    res.json({
      recommendedLength: recommendDipTubeLength({ insideDepthMm: drum.insideDepthMm, tipClearanceMinMm: settings.tipClearanceMinMm, tipClearanceMaxMm: settings.tipClearanceMaxMm }),
      packaging: drum.unPackagingCode ? checkDrumPackagingCode({ code: drum.unPackagingCode, material: drum.material, head: drum.head }) : [],
    } satisfies DrumTypeChecks);
  });

  return router;
}
