import { useRouter } from 'expo-router';
import { useState } from 'react';
import { REGION_LABELS, type Region } from '@/shared/contract/records';
import { isCalendarDate } from '@/shared/dates';
import { ApiError } from '../api/client';
import { useSourcingPlanCreateMutation, type SourcingPlanInput } from '../data/sourcing';
import { formatDate } from '../ui/format';
import { parseNumber } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';

export type PlanErrors = Record<string, string | null | undefined>;

/** The plan as typed: texts as the person typed them, picked records with their labels. */
export interface PlanDraft {
  slurryName: string;
  supplier: (PickedRef & { region: Region }) | null;
  drumType: PickedRef | null;
  startDate: string;
  perMonth: string;
  stationMode: 'all' | 'some';
  chosen: string[];
  foams: boolean;
  shear: boolean;
  notes: string;
}

const EMPTY: PlanDraft = { slurryName: '', supplier: null, drumType: null, startDate: '', perMonth: '', stationMode: 'all', chosen: [], foams: false, shear: false, notes: '' };

// The API's field name each message is kept under; a field's message goes when the field is changed.
const ERROR_KEY: Partial<Record<keyof PlanDraft, string>> = {
  slurryName: 'slurryName',
  supplier: 'supplierId',
  drumType: 'drumTypeId',
  startDate: 'startDate',
  perMonth: 'drumsPerMonth',
  chosen: 'stationIds',
  notes: 'notes',
};

/** "Slurry X from supplier Y (region R) from date D, N drums a month…", with dots for what is not given yet. */
function planSentence(d: PlanDraft, n: number | null): string {
  return [
    d.slurryName.trim() || 'Slurry …',
    `from ${d.supplier ? `${d.supplier.label} (${REGION_LABELS[d.supplier.region]})` : '…'}`,
    `from ${isCalendarDate(d.startDate.trim()) ? formatDate(d.startDate.trim()) : '…'},`,
    `${n && !Number.isNaN(n) ? n : 'N'} drums a month`,
    `in ${d.drumType?.label ?? '…'},`,
    d.stationMode === 'all' ? 'to every station.' : `to ${d.chosen.length} chosen station${d.chosen.length === 1 ? '' : 's'}.`,
  ].join(' ');
}

function planProblems(d: PlanDraft, n: number | null): PlanErrors {
  const problems: PlanErrors = {};
  if (!d.slurryName.trim()) problems.slurryName = 'Name the slurry.';
  if (!d.supplier) problems.supplierId = 'Pick the supplier.';
  if (!d.drumType) problems.drumTypeId = 'Pick the drum type the slurry arrives in.';
  if (!isCalendarDate(d.startDate.trim())) problems.startDate = 'Enter the first delivery date as YYYY-MM-DD, e.g. 2027-02-01.';
  if (n === null || Number.isNaN(n) || !Number.isInteger(n) || n < 1) problems.drumsPerMonth = 'Enter drums a month: a whole number, 1 or more.';
  if (d.stationMode === 'some' && d.chosen.length === 0) problems.stationIds = 'Choose at least one station, or plan for all stations.';
  return problems;
}

function planBody(d: PlanDraft, n: number): SourcingPlanInput {
  return {
    slurryName: d.slurryName.trim(),
    supplierId: d.supplier!.id,
    drumTypeId: d.drumType!.id,
    startDate: d.startDate.trim(),
    drumsPerMonth: n,
    ...(d.stationMode === 'some' ? { stationIds: d.chosen } : {}),
    foams: d.foams,
    shearSensitive: d.shear,
    ...(d.notes.trim() ? { notes: d.notes.trim() } : {}),
  };
}

/** The server's field messages, each in a sentence that names its field. */
function refusalErrors(err: Error): PlanErrors {
  const f = err instanceof ApiError ? err.fieldMessages() : {};
  return {
    slurryName: f.slurryName && `Slurry ${f.slurryName}.`,
    supplierId: f.supplierId && `Supplier ${f.supplierId}.`,
    drumTypeId: f.drumTypeId && `Drum type ${f.drumTypeId}.`,
    startDate: f.startDate && `Start date ${f.startDate}.`,
    drumsPerMonth: f.drumsPerMonth && `Drums a month ${f.drumsPerMonth}.`,
    stationIds: f.stationIds && `Stations: ${f.stationIds}.`,
    notes: f.notes && `Notes ${f.notes}.`,
  };
}

/** The new sourcing plan's draft, its messages and its submit, which opens the plan's impact page. */
export function usePlanForm() {
  const router = useRouter();
  const create = useSourcingPlanCreateMutation();
  const [draft, setDraft] = useState<PlanDraft>(EMPTY);
  const [errors, setErrors] = useState<PlanErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const n = parseNumber(draft.perMonth);

  const change = <K extends keyof PlanDraft>(field: K, value: PlanDraft[K]) => {
    setDraft((d) => ({ ...d, [field]: value }));
    const key = ERROR_KEY[field];
    if (key) setErrors((e) => (e[key] ? { ...e, [key]: null } : e));
  };

  const submit = () => {
    const problems = planProblems(draft, n);
    setErrors(problems);
    setFormError(null);
    if (Object.values(problems).some(Boolean)) {
      setFormError('Some fields need attention; see the messages beside them.');
      return;
    }
    create.mutate(planBody(draft, n!), {
      onSuccess: (plan) => router.push(`/sourcing/${plan.id}`),
      onError: (err) => {
        const next = refusalErrors(err);
        setErrors(next);
        setFormError(Object.values(next).some(Boolean) ? 'The plan was refused; see the messages beside the fields.' : err.message);
      },
    });
  };

  return { draft, change, errors, formError, sentence: planSentence(draft, n), submit, busy: create.isPending };
}
