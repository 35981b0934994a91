import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../auth/guards';
import { body } from '../common/validate';
import { SettingsDto } from '../registry/registry.dto';
import { loadSettings, settingsJson, updateSettings } from './settings.service';

export function settingsRouter(ds: DataSource): Router {
  const router = Router();
  router.get('/settings', async (_req, res) => {
    res.json(settingsJson(await loadSettings(ds.manager)));
  });
  router.patch('/settings', requireRole('engineer', 'admin'), body(SettingsDto), async (req, res) => {
    res.json(await updateSettings(ds, req.body as SettingsDto));
  });
  return router;
}
