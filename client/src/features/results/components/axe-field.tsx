import { useQuery } from '@apollo/client/react';

import { resultsDocuments } from '../api/results-documents.js';
import type { RackAxe } from '../api/types.js';
import { CellField } from './cell-field.js';

export interface AxeFieldProps {
  clubId: string;
  row: number;
  label: string;
  value: string;
  /** The saved axe's label, shown even when the caller cannot see that axe in the rack. */
  valueLabel: string;
  problem?: string | undefined;
  onPick(axe: RackAxe | null): void;
}

/** The entrant's club rack as a plain list (native, for the phone); the head fields fill from the pick. */
export function AxeField({ clubId, row, label, value, valueLabel, problem, onPick }: AxeFieldProps) {
  const { data } = useQuery(resultsDocuments.clubAxes, { variables: { clubId } });
  const axes = (data?.rack.axes ?? []).filter((axe) => axe.status !== 'RETIRED' || axe.id === value);
  return (
    <CellField
      select
      column="axeId"
      row={row}
      label={label}
      value={value}
      problem={problem}
      onValue={(id) => onPick(axes.find((axe) => axe.id === id) ?? null)}
      slotProps={{ select: { native: true } }}
    >
      <option value="">{axes.length ? 'Not from the rack' : 'No rack axes to pick'}</option>
      {value && !axes.some((axe) => axe.id === value) && <option value={value}>{valueLabel || 'Rack axe'}</option>}
      {axes.map((axe) => (
        <option key={axe.id} value={axe.id}>{axe.label}</option>
      ))}
    </CellField>
  );
}
