import type { DataSource, EntityManager } from 'typeorm';
import { resolveSettings } from '../../shared/fit/rules';
import { settingsProblem } from '../../shared/records/settings';
import type { FitSettings } from '../../shared/fit/types';
import { conflict, fieldError } from '../common/errors';
import { SiteSettings } from '../entities';
import { audit } from '../audit/audit';
import type { SettingsDto } from '../registry/registry.dto';
import { SETTINGS_FIELDS } from '../../shared/contract/fields';
import type { SettingsRecord } from '../../shared/contract/records';
import { copyOf, type Sent } from '../common/json';

export async function loadSettings(m: EntityManager): Promise<SiteSettings> {
  const [row] = await m.find(SiteSettings, { order: { createdAt: 'ASC' }, take: 1 });
  if (row) return row;
  return m.save(m.create(SiteSettings, { siteName: 'Our site', timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC' }));
}

export function fitSettingsOf(row: SiteSettings): FitSettings {
  return resolveSettings({
    tipClearanceMinMm: row.tipClearanceMinMm,
    tipClearanceMaxMm: row.tipClearanceMaxMm,
    threadMatchToleranceMm: row.threadMatchToleranceMm,
    laminarLimit: row.laminarLimit,
    maxReturnVelocityRatio: row.maxReturnVelocityRatio,
  });
}

/** The settings as the API answers them: the contract's field list, copied. */
export const settingsJson = (s: SiteSettings) => copyOf(s, SETTINGS_FIELDS) satisfies Sent<SettingsRecord>;

export async function updateSettings(ds: DataSource, dto: SettingsDto, userId: string) {
  return ds.transaction(async (m) => {
    const row = await loadSettings(m);
    if (row.version !== dto.version) throw conflict('Someone else changed the site settings first; review them and save again.', { current: settingsJson(row) });
    const { version: _v, ...changes } = dto;
    Object.assign(row, Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined)));
    const problem = settingsProblem({ timeZone: dto.timeZone, tipClearanceMinMm: row.tipClearanceMinMm, tipClearanceMaxMm: row.tipClearanceMaxMm });
    if (problem) throw fieldError(problem.field, problem.says);
    const before = settingsJson(await loadSettings(m));
    const saved = settingsJson(await m.save(row));
    await audit(m, { userId, action: 'update', entity: 'settings', entityId: row.id, summary: 'Site settings changed', before, after: saved });
    return saved;
  });
}
