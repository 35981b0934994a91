import { useState } from 'react';
import type { PickedFile } from '../api/upload';
import { pickCsv } from '../attachments/pick-file';
import { downloadImportTemplate, useImportRunMutation, type ImportKind } from '../data/imports';

/** The import's steps: the kind and the file chosen, the dry run (the check), the import itself and the template download. */
export function useImportFlow() {
  const [kind, setKind] = useState<ImportKind | null>(null);
  const [file, setFile] = useState<PickedFile | null>(null);
  const [progress, setProgress] = useState(0);
  const [pickError, setPickError] = useState<string | null>(null);
  const [template, setTemplate] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });
  const dry = useImportRunMutation();
  const commit = useImportRunMutation();

  const check = (k: ImportKind, f: PickedFile) => {
    commit.reset();
    setProgress(0);
    dry.mutate({ kind: k, file: f, dryRun: true, onProgress: setProgress });
  };
  const chooseKind = (k: ImportKind) => {
    setKind(k);
    // A file already chosen is checked again against the columns of the new kind.
    if (file && k !== kind) check(k, file);
  };
  const chooseFile = () => {
    // Not disabled while a file is on its way (a disabled button keeps a stale focus ring on the web): ignored.
    if (!kind || dry.isPending || commit.isPending) return;
    setPickError(null);
    pickCsv().then(
      (f) => {
        if (!f) return;
        setFile(f);
        check(kind, f);
      },
      (e: unknown) => setPickError(e instanceof Error ? e.message : 'The file could not be read.'),
    );
  };
  const importNow = () => {
    if (!kind || !file) return;
    setProgress(0);
    commit.mutate({ kind, file, dryRun: false, onProgress: setProgress });
  };
  const startOver = () => {
    setFile(null);
    dry.reset();
    commit.reset();
  };
  const getTemplate = () => {
    if (!kind) return;
    setTemplate({ busy: true, error: null });
    downloadImportTemplate(kind).then(
      () => setTemplate({ busy: false, error: null }),
      (e: unknown) => setTemplate({ busy: false, error: e instanceof Error ? e.message : 'The template could not be fetched.' }),
    );
  };

  return { kind, file, progress, pickError, template, dry, commit, check, chooseKind, chooseFile, importNow, startOver, getTemplate };
}

export type ImportFlowState = ReturnType<typeof useImportFlow>;
