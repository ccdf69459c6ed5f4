import { Alert, Button, MenuItem, Stack, TextField } from '@mui/material';
import {
  SPECTRUM_GENERATOR_LABELS,
  type SpectrumGenerateRequest,
  type SpectrumGenerateResponse,
  type SpectrumSource,
} from '@tiermode/shared-types';
import { useState } from 'react';
import { errorMessages } from '@/lib/api-client';
import { useGenerateSpectrum } from '../api/generate-spectrum';

type Kind = SpectrumGenerateRequest['kind'];

const FIELDS: Record<
  Kind,
  { name: keyof SpectrumGenerateRequest; label: string; initial: string }[]
> = {
  'asce7-two-period': [
    { name: 'sds', label: 'SDS (g)', initial: '1.0' },
    { name: 'sd1', label: 'SD1 (g)', initial: '0.6' },
    { name: 'tl', label: 'TL (s)', initial: '8' },
    { name: 's1', label: 'S1 (g), for the checks', initial: '' },
  ],
  'en1998-elastic': [
    { name: 'agR', label: 'agR (g)', initial: '0.25' },
    { name: 'importanceFactor', label: 'Importance factor γI', initial: '1.0' },
    { name: 'dampingPercent', label: 'Damping ξ (%)', initial: '5' },
  ],
  'en1998-design': [
    { name: 'agR', label: 'agR (g)', initial: '0.25' },
    { name: 'importanceFactor', label: 'Importance factor γI', initial: '1.0' },
    { name: 'q', label: 'Behaviour factor q', initial: '3.9' },
    { name: 'beta', label: 'Lower-bound factor β', initial: '0.2' },
  ],
};

/** The form's starting values: those the spectrum was generated with, where it was. */
function startingValues(source: SpectrumSource | undefined) {
  if (!source || source.kind === 'user') {
    return { kind: 'asce7-two-period' as Kind, values: {}, groundType: 'C', spectrumType: '1' };
  }
  const { groundType, spectrumType, ...numbers } = source.parameters;
  return {
    kind: source.kind,
    values: Object.fromEntries(
      Object.entries(numbers)
        .filter(([, v]) => v !== undefined)
        .map(([name, v]) => [name, String(v)]),
    ) as Record<string, string>,
    groundType: groundType ?? 'C',
    spectrumType: String(spectrumType ?? 1),
  };
}

/**
 * Generates an editable spectrum table from code parameters; the server checks them. It opens
 * with the parameters the current spectrum was generated with, so a reload shows the values
 * behind the table, not the defaults.
 */
export function SpectrumGeneratorForm({
  source,
  onGenerated,
}: {
  source?: SpectrumSource;
  onGenerated: (r: SpectrumGenerateResponse) => void;
}) {
  const generate = useGenerateSpectrum();
  const [start] = useState(() => startingValues(source));
  const [kind, setKind] = useState<Kind>(start.kind);
  const [values, setValues] = useState<Record<string, string>>(start.values);
  const [groundType, setGroundType] = useState(start.groundType);
  const [spectrumType, setSpectrumType] = useState(start.spectrumType);
  const value = (name: string, initial: string) => values[name] ?? initial;
  const isEn = kind !== 'asce7-two-period';

  const submit = () => {
    const body: Record<string, unknown> = { kind };
    for (const f of FIELDS[kind]) {
      const text = value(f.name, f.initial).trim();
      body[f.name] = text === '' ? undefined : Number(text);
    }
    // Kept from the spectrum it opened with, though the form has no field for it.
    if (values.maxPeriod !== undefined) body.maxPeriod = Number(values.maxPeriod);
    if (isEn) {
      body.groundType = groundType;
      body.spectrumType = Number(spectrumType);
    }
    generate.mutate(body as unknown as SpectrumGenerateRequest, { onSuccess: onGenerated });
  };

  return (
    <Stack
      spacing={1.5}
      component="form"
      aria-label="Spectrum generator"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <TextField
        select
        label="Generator"
        size="small"
        value={kind}
        onChange={(e) => setKind(e.target.value as Kind)}
      >
        {(Object.keys(SPECTRUM_GENERATOR_LABELS) as Kind[]).map((k) => (
          <MenuItem key={k} value={k}>
            {SPECTRUM_GENERATOR_LABELS[k]}
          </MenuItem>
        ))}
      </TextField>
      <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap' }}>
        {FIELDS[kind].map((f) => (
          <TextField
            key={`${kind}-${f.name}`}
            label={f.label}
            size="small"
            sx={{ width: 170 }}
            value={value(f.name, f.initial)}
            onChange={(e) => setValues({ ...values, [f.name]: e.target.value })}
            slotProps={{ htmlInput: { inputMode: 'decimal' } }}
          />
        ))}
        {isEn && (
          <>
            <TextField
              select
              label="Ground type"
              size="small"
              sx={{ width: 130 }}
              value={groundType}
              onChange={(e) => setGroundType(e.target.value)}
            >
              {['A', 'B', 'C', 'D', 'E'].map((g) => (
                <MenuItem key={g} value={g}>
                  {g}
                </MenuItem>
              ))}
            </TextField>
            <TextField
              select
              label="Spectrum type"
              size="small"
              sx={{ width: 130 }}
              value={spectrumType}
              onChange={(e) => setSpectrumType(e.target.value)}
            >
              <MenuItem value="1">Type 1</MenuItem>
              <MenuItem value="2">Type 2</MenuItem>
            </TextField>
          </>
        )}
      </Stack>
      {generate.isError && (
        <Alert severity="error" role="alert">
          {errorMessages(generate.error).join(' ')}
        </Alert>
      )}
      <div>
        <Button type="submit" variant="outlined" disabled={generate.isPending}>
          {generate.isPending ? 'Generating…' : 'Generate the table'}
        </Button>
      </div>
    </Stack>
  );
}
