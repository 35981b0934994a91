import { useCallback, useRef, useState } from 'react';
import type { TextInput } from 'react-native';
import { localDate, lotDateProblems, type TemperatureIndicator } from '@/shared/acceptance';
import type { DrumLabel } from '@/shared/gs1';
import { lotNumberProblem } from '@/shared/lot-number';
import { provisionalCheck, SnapshotGap, type ProvisionalCheck } from '@/shared/dock/snapshot';
import { ApiError, isNetworkError } from '../api/client';
import { useDockSnapshot } from '../data/dock-snapshot';
import { useQueueDockCheck } from '../data/dock-queue';
import { isOnline } from '../offline/network';
import { useLengthUnit } from '../data/me';
import { useReceivingCheckCreateMutation, type ReceivingCheckInput } from '../data/receiving';
import { useSettingsQuery } from '../data/settings';
import { lengthDraft, lengthDraftMm, parseNumber, type LengthDraft } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import type { OpeningDraft } from './opening-editor';

export type DrumMode = 'pick' | 'describe';

/** Everything the clerk enters for one lot. */
export interface DockDraft {
  lot: string;
  count: string;
  supplier: PickedRef | null;
  slurry: PickedRef | null;
  mode: DrumMode;
  drumType: PickedRef | null;
  openings: OpeningDraft[];
  depth: LengthDraft;
  station: PickedRef | null;
  productionDate: string;
  expiryDate: string;
  indicator: TemperatureIndicator | null;
  /** The drum label last scanned for this lot (null: typed by hand, or typed over since). */
  label: DrumLabel | null;
}

export type DockErrors = Record<string, string | null | undefined>;

let openingSeq = 0;
export const newOpening = (label: string): OpeningDraft => ({ key: `o${++openingSeq}`, label, threadCode: null, keyCode: null });

const emptyDraft = (unit: LengthDraft['unit']): DockDraft => ({
  lot: '',
  count: '1',
  supplier: null,
  slurry: null,
  mode: 'pick',
  drumType: null,
  openings: [newOpening('large bung')],
  depth: lengthDraft(null, unit),
  station: null,
  productionDate: '',
  expiryDate: '',
  indicator: null,
  label: null,
});

const SERVER_FIELDS: Record<string, [string, string]> = {
  lotNumber: ['lotNumber', 'Lot number'],
  drumCount: ['drumCount', 'Drum count'],
  supplierId: ['supplierId', 'Supplier'],
  slurryId: ['slurryId', 'Slurry'],
  drumTypeId: ['drumTypeId', 'Drum type'],
  'drum.insideDepthMm': ['depth', 'Inside depth'],
  drum: ['depth', 'Inside depth'],
  stationId: ['stationId', 'Station'],
  productionDate: ['productionDate', 'Production date'],
  expiryDate: ['expiryDate', 'Expiry date'],
  temperatureIndicator: ['indicator', 'Temperature indicator'],
};

/** The server's (or the kept registry's) field messages, placed beside the dock form's fields. */
function placeFieldMessages(f: Record<string, string>, whole = false): DockErrors {
  const next: DockErrors = {};
  for (const [path, message] of Object.entries(f)) {
    const mapped = SERVER_FIELDS[path];
    const opening = /^drum\.openings\.(\d+)\./.exec(path);
    if (mapped && !next[mapped[0]]) next[mapped[0]] = whole ? message : `${mapped[1]} ${message}.`;
    else if (opening) next[`opening${opening[1]}`] = whole ? message : `This opening ${message}.`;
  }
  return next;
}

/** A check worked out on this phone with no network, shown as provisional while it waits to be sent. */
export interface ProvisionalShown {
  check: ProvisionalCheck;
  body: ReceivingCheckInput;
  clientKey: string;
  /** When the server last confirmed the kept registry. */
  registryAsOf: string;
}

const newKey = (): string =>
  typeof crypto !== 'undefined' && 'randomUUID' in crypto
    ? crypto.randomUUID()
    : // crypto.randomUUID exists only in secure contexts (not on a plain-http intranet address): RFC 4122 v4 from getRandomValues.
      '10000000-1000-4000-8000-100000000000'.replace(/[018]/g, (c) => (Number(c) ^ (crypto.getRandomValues(new Uint8Array(1))[0] & (15 >> (Number(c) / 4)))).toString(16));

function check(d: DockDraft, today: string): { body: ReceivingCheckInput | null; problems: DockErrors } {
  const problems: DockErrors = {};
  const n = parseNumber(d.count);
  if (!d.lot.trim()) problems.lotNumber = 'Enter the lot number from the drum label.';
  else problems.lotNumber = lotNumberProblem(d.lot.trim());
  if (n === null || Number.isNaN(n) || !Number.isInteger(n) || n < 1) problems.drumCount = 'Enter how many drums arrived: a whole number, 1 or more.';
  const dates = lotDateProblems({ today, productionDate: d.productionDate.trim() || null, expiryDate: d.expiryDate.trim() || null });
  if (dates.productionDate) problems.productionDate = `Production date ${dates.productionDate}.`;
  if (dates.expiryDate) problems.expiryDate = `Expiry date ${dates.expiryDate}.`;
  if (!d.indicator) problems.indicator = 'Say what the temperature indicator shows (or that none is fitted).';
  let drum: ReceivingCheckInput['drum'];
  if (d.mode === 'pick') {
    if (!d.drumType) problems.drumTypeId = 'Pick the drum type, or measure the drum instead.';
  } else {
    const mm = lengthDraftMm(d.depth);
    if (mm === null || Number.isNaN(mm) || mm <= 0) problems.depth = 'Enter the inside depth, from the bung seat to the inside bottom.';
    d.openings.forEach((o, i) => {
      if (!o.threadCode) problems[`opening${i}`] = 'Identify this bung’s thread and pick it.';
    });
    drum = { insideDepthMm: mm ?? 0, openings: d.openings.map((o) => ({ label: o.label, threadCode: o.threadCode ?? '', keyCode: o.keyCode?.id ?? null })) };
  }
  if (Object.values(problems).some(Boolean)) return { body: null, problems };
  return {
    problems,
    body: {
      lotNumber: d.lot.trim(),
      drumCount: n!,
      ...(d.supplier ? { supplierId: d.supplier.id } : {}),
      ...(d.slurry ? { slurryId: d.slurry.id } : {}),
      ...(d.mode === 'pick' ? { drumTypeId: d.drumType!.id } : { drum }),
      ...(d.station ? { stationId: d.station.id } : {}),
      ...(d.productionDate.trim() ? { productionDate: d.productionDate.trim() } : {}),
      ...(d.expiryDate.trim() ? { expiryDate: d.expiryDate.trim() } : {}),
      temperatureIndicator: d.indicator!,
    },
  };
}

/**
 * The dock check's state, shaped like the registry forms' useRecordForm: one draft, messages by field, the
 * server's messages mapped back to them, submit, and start again. `applyLabel` is where a scanned drum
 * label lands (its batch as the lot number, its GS1 dates); null drops a label the clerk typed over.
 */
export function useDockForm() {
  const { unit } = useLengthUnit();
  const settings = useSettingsQuery();
  const create = useReceivingCheckCreateMutation();
  const queue = useQueueDockCheck();
  const kept = useDockSnapshot();
  const [provisional, setProvisional] = useState<ProvisionalShown | null>(null);
  const [draft, setDraft] = useState<DockDraft>(() => emptyDraft(unit));
  const [errors, setErrors] = useState<DockErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [recordId, setRecordId] = useState<string | undefined>();
  const lotRef = useRef<TextInput>(null);

  const set = useCallback(<K extends keyof DockDraft>(key: K, value: DockDraft[K] | ((old: DockDraft[K]) => DockDraft[K])) => {
    setDraft((d) => ({ ...d, [key]: typeof value === 'function' ? (value as (old: DockDraft[K]) => DockDraft[K])(d[key]) : value }));
  }, []);

  const applyLabel = useCallback((label: DrumLabel | null) => {
    setDraft((d) =>
      label ? { ...d, label, lot: label.batch ?? d.lot, productionDate: label.productionDate ?? d.productionDate, expiryDate: label.expiryDate ?? d.expiryDate } : { ...d, label: null },
    );
  }, []);

  const submit = () => {
    if (create.isPending) return;
    // The site's date, as the server judges it; the device's own zone until the settings have loaded.
    const zone = settings.data?.timeZone ?? Intl.DateTimeFormat().resolvedOptions().timeZone;
    const { body, problems } = check(draft, localDate(new Date(), zone));
    setErrors(problems);
    setFormError(null);
    if (!body) {
      setFormError('Some fields need attention; see the messages beside them.');
      return;
    }
    const clientKey = newKey();
    const sendLater = () => {
      const registry = kept.data;
      if (!registry) {
        setFormError('There is no network, and this phone has no copy of the registry yet to judge the lot with. Open the dock check once with the network on; then it works without.');
        return;
      }
      try {
        const now = new Date();
        const worked = provisionalCheck(registry.snapshot, body, now);
        const said = { decision: worked.lotVerdict.decision, verdict: worked.result.verdict, sentence: worked.lotVerdict.sentence, revision: registry.snapshot.revision, madeAt: now.toISOString() };
        queue.mutate({ body: { ...body, clientKey, provisional: said }, queuedAt: now.toISOString() });
        setProvisional({ check: worked, body, clientKey, registryAsOf: registry.fetchedAt });
      } catch (err) {
        if (!(err instanceof SnapshotGap)) throw err;
        setErrors(placeFieldMessages({ [err.field]: err.message }, true));
        setFormError(err.message);
      }
    };
    if (!isOnline()) {
      sendLater();
      return;
    }
    create.mutate(
      { ...body, clientKey },
      {
        onSuccess: (saved) => setRecordId(saved.id),
        onError: (err) => {
          // No answer: judged here and sent later under the same key (if the first send did arrive, the server
          // answers it again instead of recording twice).
          if (isNetworkError(err)) return sendLater();
          const next = placeFieldMessages(err instanceof ApiError ? err.fieldMessages() : {});
          setErrors(next);
          setFormError(Object.values(next).some(Boolean) ? 'The check was refused; see the messages beside the fields.' : err.message);
        },
      },
    );
  };

  const startAgain = () => {
    setRecordId(undefined);
    setProvisional(null);
    setDraft(emptyDraft(unit));
    setErrors({});
    setFormError(null);
    create.reset();
    setTimeout(() => lotRef.current?.focus(), 0);
  };

  return { draft, set, applyLabel, errors, formError, submit, saving: create.isPending, recordId, provisional, startAgain, lotRef };
}

export type DockForm = ReturnType<typeof useDockForm>;
