import { includedAngleFromThickness, includedFromPerSide, inchesToMm, mmToInches, perSideFromIncluded, shoulderThickness, type ChiselMeasure } from '@endgrain/shared';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { useState } from 'react';

import type { UnitPreference } from '../api/types.js';
import { readNumber } from '../lib/setup-units.js';
import { SectionCard } from '../../../components/ui/section-card.js';

type Unit = 'mm' | 'in';
const toMm = (value: number, unit: Unit) => (unit === 'in' ? inchesToMm(value) : value);
const round = (value: number, digits: number) => String(Number(value.toFixed(digits)));
const bothUnits = (mm: number) => `${round(mm, 3)} mm = ${round(mmToInches(mm), 4)} in`;
const deg = (value: number) => `${round(value, 3)}°`;

function Toggle<T extends string>({ label, value, options, onChange }: { label: string; value: T; options: [T, string][]; onChange: (next: T) => void }) {
  return (
    <ToggleButtonGroup exclusive size="small" color="primary" aria-label={label} value={value} onChange={(_event, next: T | null) => next && onChange(next)}>
      {options.map(([key, text]) => (
        <ToggleButton key={key} value={key}>
          {text}
        </ToggleButton>
      ))}
    </ToggleButtonGroup>
  );
}

function NumberBox({ label, value, onChange, unit }: { label: string; value: string; onChange: (text: string) => void; unit: string }) {
  const bad = Number.isNaN(readNumber(value));
  return (
    <TextField
      label={label}
      value={value}
      onChange={(event) => onChange(event.target.value)}
      error={bad}
      helperText={bad ? 'Type a number, such as 15, 0.75 or 3/4.' : ' '}
      slotProps={{ input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> }, htmlInput: { inputMode: 'decimal' } }}
    />
  );
}

/** Answers a sentence, or says what is missing; a geometry that cannot exist is named as such. */
function attempt(run: () => string): string {
  try {
    return run();
  } catch (error) {
    return error instanceof RangeError ? `Those numbers do not make a bevel: ${error.message}.` : 'Those numbers do not make a bevel.';
  }
}

/** Bevel trigonometry for a symmetric bit, both ways round, with per-side and included angles labelled. */
export function GeometryCalculator({ units }: { units: UnitPreference }) {
  const [unit, setUnit] = useState<Unit>(units === 'IMPERIAL' ? 'in' : 'mm');
  const [measure, setMeasure] = useState<ChiselMeasure>('back-from-edge');
  const [angleIs, setAngleIs] = useState<'included' | 'per-side'>('included');
  const [angle, setAngle] = useState('15');
  const [width, setWidth] = useState(units === 'IMPERIAL' ? '3/4' : '19.05');
  const [thickness, setThickness] = useState('');
  const [distance, setDistance] = useState('');

  const a = readNumber(angle);
  const w = readNumber(width);
  const forward =
    a === null || w === null || Number.isNaN(a) || Number.isNaN(w)
      ? 'Type an angle and a chisel width.'
      : attempt(() => {
          const included = angleIs === 'included' ? a : includedFromPerSide(a);
          const t = shoulderThickness({ includedDeg: included, chiselWidthMm: toMm(w, unit), measuredAlong: measure });
          const fn = measure === 'back-from-edge' ? 'tan' : 'sin';
          return `${deg(included)} included (${deg(perSideFromIncluded(included))} per side): thickness at the shoulder = 2 × ${round(w, 4)} ${unit} × ${fn} ${deg(perSideFromIncluded(included))} = ${bothUnits(t)}`;
        });
  const t = readNumber(thickness);
  const d = readNumber(distance);
  const backward =
    t === null || d === null || Number.isNaN(t) || Number.isNaN(d)
      ? 'Type a thickness and how far behind the edge it was measured.'
      : attempt(() => {
          const included = includedAngleFromThickness({ thicknessMm: toMm(t, unit), distanceMm: toMm(d, unit), measuredAlong: measure });
          return `Included angle ${deg(included)}, which is ${deg(perSideFromIncluded(included))} per side.`;
        });

  return (
    <Stack spacing={3}>
      <Stack direction="row" spacing={2} sx={{ flexWrap: 'wrap', rowGap: 1 }}>
        <Toggle label="Length unit" value={unit} options={[['mm', 'mm'], ['in', 'in']]} onChange={setUnit} />
        <Toggle label="How the width is measured" value={measure} options={[['back-from-edge', 'Straight back from the edge'], ['along-face', 'Along the face']]} onChange={setMeasure} />
      </Stack>
      <SectionCard title="Thickness at the chisel shoulder">
        <Stack spacing={2}>
          <Toggle label="The angle is" value={angleIs} options={[['included', 'Included (both faces)'], ['per-side', 'Per side (one face)']]} onChange={setAngleIs} />
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
            <NumberBox label={angleIs === 'included' ? 'Included angle' : 'Per-side angle'} value={angle} onChange={setAngle} unit="°" />
            <NumberBox label="Chisel width" value={width} onChange={setWidth} unit={unit} />
          </Stack>
          <Typography role="status" aria-label="Shoulder thickness">
            {forward}
          </Typography>
        </Stack>
      </SectionCard>
      <SectionCard title="Included angle from a thickness">
        <Stack spacing={2}>
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
            <NumberBox label="Thickness" value={thickness} onChange={setThickness} unit={unit} />
            <NumberBox label="Distance behind the edge" value={distance} onChange={setDistance} unit={unit} />
          </Stack>
          <Typography role="status" aria-label="Included angle">
            {backward}
          </Typography>
        </Stack>
      </SectionCard>
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
        For a symmetric bit, taking the edge as a sharp line. The included angle is across both faces; the per-side
        angle is each face against the bit&apos;s centre plane, half the included angle.
      </Typography>
    </Stack>
  );
}
