import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { LengthUnit } from '@/shared/units';
import { useLengthUnit } from '../data/me';
import type { resourceQueries } from '../data/resource';
import { formProblemOf, type FieldErrors } from '../ui/form-errors';
import { describeValue, reapply, sameMeaning, theirChanges, type Draft } from './draft';

type Stamped = { id: string; version: number };

/** How one resource's form reads a record, checks itself and builds the request body. */
export interface FormSpec<R extends Stamped, D extends Draft> {
  /** "dip tube": used in titles and messages. */
  noun: string;
  empty: (unit: LengthUnit) => D;
  fromRecord: (record: R, unit: LengthUnit) => D;
  /** Messages by API field path, in the order the fields appear. */
  check: (draft: D) => FieldErrors;
  /** The JSON body, lengths in mm. Only called on a draft that passed `check`. */
  toBody: (draft: D, mode: 'create' | 'update') => Record<string, unknown>;
  /** The label of a field path the form shows ("openings.1.threadCode" → "Opening 2 thread"). */
  labelOf: (path: string) => string | undefined;
  /** Rewords a server message for a field when the generic "<label> <message>" would not say what happened. */
  serverMessage?: (path: string, message: string) => string | undefined;
  /** A field's value in words for the conflict summary, when describeValue is not enough. */
  describe?: (key: string, draft: D) => string | undefined;
}

export type RecordSource<R extends Stamped> = ReturnType<typeof resourceQueries<R, Record<string, unknown>>>;

export interface ConflictRow {
  key: string;
  label: string;
  theirs: string;
  mine: string;
  both: boolean;
}

export interface Conflict<R> {
  theirs: R;
  message: string;
  rows: ConflictRow[];
  /** Labels of the fields this person changed: what re-applying puts back. */
  yours: string[];
}

export interface Focusable {
  focus: () => void;
}

/** The conflict summary: what they changed beside what this person has, and which fields this person changed. */
function conflictOf<R extends Stamped, D extends Draft>(spec: FormSpec<R, D>, base: R, theirs: R, draft: D, unit: LengthUnit, message: string): Conflict<R> {
  const original = spec.fromRecord(base, unit);
  const theirsDraft = spec.fromRecord(theirs, unit);
  const rows = theirChanges(original, theirsDraft, draft).map(({ key, both }) => ({
    key,
    label: spec.labelOf(key) ?? key,
    theirs: spec.describe?.(key, theirsDraft) ?? describeValue(theirsDraft[key]),
    mine: spec.describe?.(key, draft) ?? describeValue(draft[key]),
    both,
  }));
  const yours = Object.keys(draft)
    .filter((k) => !sameMeaning(original[k], draft[k]))
    .map((k) => spec.labelOf(k) ?? k);
  return { theirs, message, rows, yours };
}

/** The draft and the notice after a conflict, keeping this person's changes on top of their version or not. */
function resolution<R extends Stamped, D extends Draft>(spec: FormSpec<R, D>, base: R, conflict: Conflict<R>, draft: D, unit: LengthUnit, keepMine: boolean) {
  const theirsDraft = spec.fromRecord(conflict.theirs, unit);
  const version = `Their version (version ${conflict.theirs.version}) is loaded`;
  if (!keepMine) return { draft: theirsDraft, notice: `${version}; your changes were dropped.` };
  const both = conflict.rows.filter((r) => r.both).map((r) => r.label);
  return {
    draft: reapply(spec.fromRecord(base, unit), theirsDraft, draft),
    notice: `${version} with your changes on top.${both.length ? ` You both changed ${both.join(', ')}: your value is kept, so check it.` : ''} Save again when it looks right.`,
  };
}

/** The fields' inputs by path, so that a submit can move the focus to the first field with a problem. */
function useFieldRefs() {
  const refs = useRef(new Map<string, Focusable>());
  const refFor = (path: string) => (el: Focusable | null) => {
    if (el) refs.current.set(path, el);
    else refs.current.delete(path);
  };
  const focusFirst = (paths: string[]) => {
    const target = paths.map((p) => refs.current.get(p)).find(Boolean);
    setTimeout(() => target?.focus(), 0);
  };
  return { refFor, focusFirst };
}

/** Which messages show: the form's own once a field is left or the form submitted; the server's until their field changes. */
function useShownErrors(clientErrors: FieldErrors) {
  const [touched, setTouched] = useState<Record<string, boolean>>({});
  const [submitted, setSubmitted] = useState(false);
  const [serverErrors, setServerErrors] = useState<FieldErrors>({});
  const errors = useMemo(() => {
    const out: FieldErrors = {};
    for (const [path, message] of Object.entries(clientErrors)) if (submitted || touched[path]) out[path] = message;
    for (const [path, message] of Object.entries(serverErrors)) if (!(path in out)) out[path] = message;
    return out;
  }, [clientErrors, serverErrors, submitted, touched]);
  const blur = useCallback((path: string) => setTouched((t) => (t[path] ? t : { ...t, [path]: true })), []);
  /** The server's messages for the field typed in (`path`), the parts below it and its draft key go. */
  const clearServer = useCallback((path: string, key: string) => {
    setServerErrors((e) => {
      const next = { ...e };
      for (const p of Object.keys(next)) if (p === path || p.startsWith(`${path}.`) || p === key) delete next[p];
      return next;
    });
  }, []);
  return { errors, blur, setSubmitted, setServerErrors, clearServer };
}

/**
 * The state of a create or edit form: the draft, messages shown on blur and on submit, server messages
 * mapped to their fields, and the optimistic-locking conflict with a way to re-apply one's changes on
 * top of the other person's version.
 */
export function useRecordForm<R extends Stamped, D extends Draft>(opts: { spec: FormSpec<R, D>; source: RecordSource<R>; id?: string; onSaved: (record: R) => void }) {
  const { spec, source, id, onSaved } = opts;
  const mode: 'create' | 'update' = id ? 'update' : 'create';
  const { unit } = useLengthUnit();
  const detail = source.useDetail(id);
  const create = source.useCreate();
  const update = source.useUpdate();

  const [base, setBase] = useState<R | null>(null);
  const [draft, setDraft] = useState<D>(() => spec.empty(unit));
  const [formError, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [conflict, setConflict] = useState<Conflict<R> | null>(null);
  const { refFor, focusFirst } = useFieldRefs();

  // An edit starts from the record as loaded, once; later refetches do not overwrite what is being typed.
  useEffect(() => {
    if (id && detail.data && base?.id !== detail.data.id) {
      setBase(detail.data);
      setDraft(spec.fromRecord(detail.data, unit));
    }
  }, [id, detail.data, base, spec, unit]);

  const clientErrors = useMemo(() => spec.check(draft), [spec, draft]);
  const { errors, blur, setSubmitted, setServerErrors, clearServer } = useShownErrors(clientErrors);

  /** Sets one field; `path` is the exact field typed in (e.g. openings.1.label), whose server message goes. */
  const set = useCallback(
    <K extends keyof D & string>(key: K, value: D[K], path: string = key) => {
      setDraft((d) => ({ ...d, [key]: value }));
      clearServer(path, key);
    },
    [clearServer],
  );

  /** Props for one field: its message, blur handling and a ref used to focus the first problem. */
  const field = (path: string) => ({
    error: errors[path] ?? null,
    onBlur: () => blur(path),
    ref: refFor(path),
  });

  const saving = create.isPending || update.isPending;

  const submit = () => {
    if (saving) return;
    setSubmitted(true);
    setNotice(null);
    const problems = Object.keys(clientErrors);
    if (problems.length) {
      const names = problems.map((p) => spec.labelOf(p) ?? p);
      setFormError(problems.length === 1 ? `Fix ${names[0]} first.` : `Fix these ${problems.length} fields first: ${names.join(', ')}.`);
      focusFirst(problems);
      return;
    }
    setFormError(null);
    const body = spec.toBody(draft, mode);
    const onError = (err: unknown) => {
      const problem = formProblemOf(err, spec.labelOf);
      if (problem.current && base) {
        setConflict(conflictOf(spec, base, problem.current as R, draft, unit, problem.form ?? ''));
        return;
      }
      const fields = Object.fromEntries(Object.entries(problem.fields).map(([path, message]) => [path, spec.serverMessage?.(path, message) ?? message]));
      setServerErrors(fields);
      setFormError(problem.form);
      focusFirst(Object.keys(fields));
    };
    if (mode === 'create') create.mutate(body, { onSuccess: onSaved, onError });
    else if (base) update.mutate({ ...body, id: base.id, version: base.version }, { onSuccess: onSaved, onError });
  };

  /** After a conflict: their version becomes the base, with this person's changes put back on top or dropped. */
  const resolve = (keepMine: boolean) => {
    if (!conflict || !base) return;
    const next = resolution(spec, base, conflict, draft, unit, keepMine);
    setDraft(next.draft);
    setBase(conflict.theirs);
    setConflict(null);
    setServerErrors({});
    setFormError(null);
    setNotice(next.notice);
  };
  // Loads their version and puts back every field this person changed; they check it and save again.
  const reapplyMine = () => resolve(true);
  const takeTheirs = () => resolve(false);

  return { mode, detail, base, draft, set, setDraft, field, errors, blur, submit, saving, formError, notice, conflict, reapplyMine, takeTheirs, unit };
}

export type RecordForm<R extends Stamped, D extends Draft> = ReturnType<typeof useRecordForm<R, D>>;
