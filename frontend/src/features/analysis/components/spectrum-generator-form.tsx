import { Alert, Button, MenuItem, Stack, TextField } from '@mui/material';
import type { SpectrumGenerateRequest, SpectrumGenerateResponse } from '@tiermode/shared-types';
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

const KIND_LABELS: Record<Kind, string> = {
  'asce7-two-period': 'ASCE 7 two-period (11.4.6)',
  'en1998-elastic': 'EN 1998-1 elastic (3.2.2.2)',
  'en1998-design': 'EN 1998-1 design (3.2.2.5)',
};

/** Generates an editable spectrum table from code parameters; the server checks them. */
export function SpectrumGeneratorForm({
  onGenerated,
}: {
  onGenerated: (r: SpectrumGenerateResponse) => void;
}) {
  const generate = useGenerateSpectrum();
  const [kind, setKind] = useState<Kind>('asce7-two-period');
  const [values, setValues] = useState<Record<string, string>>({});
  const [groundType, setGroundType] = useState('C');
  const [spectrumType, setSpectrumType] = useState('1');
  const value = (name: string, initial: string) => values[name] ?? initial;
  const isEn = kind !== 'asce7-two-period';

  const submit = () => {
    const body: Record<string, unknown> = { kind };
    for (const f of FIELDS[kind]) {
      const text = value(f.name, f.initial).trim();
      body[f.name] = text === '' ? undefined : Number(text);
    }
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
        {(Object.keys(KIND_LABELS) as Kind[]).map((k) => (
          <MenuItem key={k} value={k}>
            {KIND_LABELS[k]}
          </MenuItem>
        ))}
      </TextField>
      <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap' }}>
        {FIELDS[kind].map((f) => (
          <TextField
            key={`${kind}-${f.name}`}
            label={f.label}
            size="small"
            sx={{ width: 150 }}
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
