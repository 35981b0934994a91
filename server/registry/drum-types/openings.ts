import { fieldError } from '../../common/errors';
import { parseDto } from '../../common/validate';
import { DRUM_TYPE_SAYS } from '../../../shared/records/drum-type';
import { DrumOpening, DrumType } from '../../entities';
import type { Dto } from '../common';
import { resolveKey, resolveThread } from '../refs';
import { OpeningDto } from '../registry.dto';
import type { WriteContext } from '../resource';
import type { OpeningRecord } from '../../../shared/contract/records';
import type { Sent } from '../../common/json';

export const openingJson = (o: DrumOpening) =>
  ({ id: o.id, label: o.label, threadCode: o.threadSpec?.code ?? null, boreMm: o.boreMm, keyCode: o.keyCode?.code ?? null, position: o.position }) satisfies Sent<OpeningRecord>;

/** Replaces a drum type's openings, each validated in full and its codes resolved (inside the caller's transaction). */
export async function writeOpenings(drum: DrumType, dto: Dto, { manager }: WriteContext): Promise<void> {
  if (dto.openings === undefined) return;
  if (!Array.isArray(dto.openings) || dto.openings.length === 0) throw fieldError('openings', 'must list at least one opening');
  const labels = new Set<string>();
  const rows: Partial<DrumOpening>[] = [];
  for (const [i, raw] of dto.openings.entries()) {
    const o = await parseDto(OpeningDto, { ...(raw as object) }).catch((err) => {
      throw prefixFields(err, `openings.${i}`);
    });
    if (labels.has(o.label)) throw fieldError(`openings.${i}.label`, DRUM_TYPE_SAYS.openingLabel);
    labels.add(o.label);
    const thread = await resolveThread(manager, o.threadCode, `openings.${i}.threadCode`);
    rows.push({
      drumTypeId: drum.id,
      label: o.label,
      threadSpecId: thread.id,
      boreMm: o.boreMm,
      keyCodeId: await resolveKey(manager, o.keyCode, `openings.${i}.keyCode`),
      position: o.position as DrumOpening['position'],
    });
  }
  await manager.delete(DrumOpening, { drumTypeId: drum.id });
  for (const row of rows) await manager.save(manager.create(DrumOpening, row));
}

function prefixFields(err: unknown, prefix: string): unknown {
  const e = err as { details?: Array<{ field: string }> };
  if (Array.isArray(e.details)) for (const d of e.details) d.field = `${prefix}.${d.field}`;
  return err;
}
