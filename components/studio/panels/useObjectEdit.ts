'use client';
// Binds inspector fields of one object to validated, undoable edits.
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { keepCalibrationTrue } from '../state/calibration';
import { replaceObjects } from '../state/document';
import type { DesignObject } from '../state/types';
import { checkObjectEdit, type DisplayUnits, type FieldKind } from './validate';

export function useUnits(): DisplayUnits {
  const { store } = useCommandContext();
  const length = useStudio(store, (s) => s.session.lengthUnit);
  const temp = useStudio(store, (s) => s.session.tempUnit);
  return { length, temp };
}

export function useObjectEdit(object: DesignObject) {
  const { store } = useCommandContext();
  const units = useUnits();
  const replace = (edited: DesignObject) => {
    const next =
      object.type === 'lamp' && edited.type === 'lamp' ? keepCalibrationTrue(object, edited) : edited;
    store.edit((d) => replaceObjects(d, new Map([[object.id, next]])));
  };
  const field = (key: string, kind: FieldKind) => ({
    kind,
    units,
    value: (object as Record<string, unknown>)[key] as number | undefined,
    check: (v: number | undefined) => checkObjectEdit(object, key, v, kind, units),
    onCommit: (v: number | undefined) => {
      const r = checkObjectEdit(object, key, v, kind, units);
      if (r.ok) replace(r.value);
    },
  });
  return { units, field, replace };
}
