import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { body } from '../common/validate';
import { SettingsDto } from '../registry/registry.dto';
import { loadSettings, settingsJson, updateSettings } from './settings.service';

export function settingsRouter(ds: DataSource): Router {
  const router = Router();
  const r = secured(router);
  r.get('/settings', async (_req, res) => {
    res.json(settingsJson(await loadSettings(ds.manager)));
  });
  r.patch('/settings', body(SettingsDto), async (req, res) => {
    res.json(await updateSettings(ds, req.body as SettingsDto, req.user!.id));
  });
  return router;
}
