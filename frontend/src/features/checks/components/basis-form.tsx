import { Alert, AlertTitle, Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import {
  basisValuesFromSpectrum,
  CODE_BASIS_LABELS,
  CODE_BASES,
  readableValue,
  spectrumBasisMismatches,
  type CodeBasisParameters,
  type SpectrumSource,
} from '@tiermode/shared-types';
import { useFormik } from 'formik';
import { useMemo, useState } from 'react';
import type { UnitSystem } from '@/lib/units';
import {
  basisSchema,
  ctToDisplay,
  FIELDS,
  fieldLabel,
  fromBasis,
  PERIOD_SYSTEMS,
  PER_LEVEL,
  perLevel,
  perLevelLabel,
  toBasis,
  type BasisFormValues,
} from './basis-schema';

/**
 * The code basis and its parameters, each with the clause it comes from. Where the design
 * spectrum was generated for this code, the values it was generated with (SDS, SD1, TL, ag, q...)
 * are taken from it and cannot be typed apart from it; a saved basis that disagrees is said.
 */
export function BasisForm({
  basis,
  defaultCode,
  storeys,
  spectrumSource,
  units,
  readOnly,
  saving,
  onSave,
}: {
  basis: CodeBasisParameters | null;
  /** The number of storeys, for the per-level list. */
  storeys: number;
  defaultCode: CodeBasisParameters['code'];
  /** Where the calc's design spectrum came from. */
  spectrumSource?: SpectrumSource;
  units: UnitSystem;
  readOnly: boolean;
  saving: boolean;
  onSave: (basis: CodeBasisParameters) => void;
}) {
  const [code, setCode] = useState<CodeBasisParameters['code']>(basis?.code ?? defaultCode);
  const fromSpectrum = useMemo(
    () => basisValuesFromSpectrum(spectrumSource, code),
    [spectrumSource, code],
  );
  const fixed = new Set(fromSpectrum.map((v) => v.field));
  const initialValues = useMemo(() => {
    const values = fromBasis(basis, code, units);
    for (const v of fromSpectrum) values[v.field] = readableValue(v.value);
    return values;
  }, [basis, code, units, fromSpectrum]);
  const mismatches = basis ? spectrumBasisMismatches(basis, spectrumSource) : [];
  const form = useFormik<BasisFormValues>({
    initialValues,
    enableReinitialize: true,
    validationSchema: basisSchema(code),
    validate: (values) => {
      if (code === 'USER') return {};
      try {
        perLevel(values[PER_LEVEL[code].name] ?? '', storeys);
        return {};
      } catch (error) {
        return { [PER_LEVEL[code].name]: (error as Error).message };
      }
    },
    onSubmit: (values) => onSave(toBasis(values, storeys, units)),
  });
  return (
    <Stack
      component="form"
      spacing={2}
      onSubmit={form.handleSubmit}
      noValidate
      aria-label="Code basis"
    >
      <TextField
        select
        size="small"
        label="Code basis"
        value={code}
        disabled={readOnly}
        onChange={(e) => setCode(e.target.value as CodeBasisParameters['code'])}
        sx={{ maxWidth: 280 }}
      >
        {CODE_BASES.map((c) => (
          <MenuItem key={c} value={c}>
            {CODE_BASIS_LABELS[c]}
          </MenuItem>
        ))}
      </TextField>
      {code === 'ASCE7-22' && !readOnly && (
        <TextField
          select
          size="small"
          label="Structural system (fills Ct and x)"
          value=""
          onChange={(e) => {
            const system = PERIOD_SYSTEMS.find((s) => s.label === e.target.value);
            if (system) {
              const shown = ctToDisplay(units, system.ct, system.x);
              void form.setFieldValue('ct', String(Number(shown.toPrecision(3))));
              void form.setFieldValue('x', String(system.x));
            }
          }}
          helperText="ASCE 7-22 Table 12.8-2 (from memory)"
          sx={{ maxWidth: 420 }}
        >
          {PERIOD_SYSTEMS.map((s) => (
            <MenuItem key={s.label} value={s.label}>
              {s.label} (Ct {Number(ctToDisplay(units, s.ct, s.x).toPrecision(3))}, x {s.x})
            </MenuItem>
          ))}
        </TextField>
      )}
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 2 }}>
        {FIELDS[code].map((field) => (
          <TextField
            key={field.name}
            select={Boolean(field.options)}
            size="small"
            name={field.name}
            label={fieldLabel(field, units)}
            value={form.values[field.name] ?? ''}
            onChange={form.handleChange}
            onBlur={form.handleBlur}
            error={Boolean(form.touched[field.name] && form.errors[field.name])}
            helperText={
              (form.touched[field.name] && form.errors[field.name]) ||
              (fixed.has(field.name) ? `${field.clause}; from the design spectrum` : field.clause)
            }
            disabled={readOnly || fixed.has(field.name)}
            sx={{ width: 200 }}
          >
            {field.options?.map((o) => (
              <MenuItem key={o} value={o}>
                {o}
              </MenuItem>
            ))}
          </TextField>
        ))}
      </Stack>
      {code !== 'USER' && (
        <TextField
          size="small"
          name={PER_LEVEL[code].name}
          label={perLevelLabel(code, units)}
          placeholder={
            code === 'ASCE7-22' ? 'Blank: each storey mass x g' : 'Blank: the storey masses'
          }
          value={form.values[PER_LEVEL[code].name] ?? ''}
          onChange={form.handleChange}
          onBlur={form.handleBlur}
          error={Boolean(form.errors[PER_LEVEL[code].name])}
          helperText={
            form.errors[PER_LEVEL[code].name] ??
            `Storey 1 first, separated by commas (${code === 'ASCE7-22' ? 'ASCE 7-22 12.7.2' : 'EN 1998-1:2004 3.2.4'})`
          }
          disabled={readOnly}
          fullWidth
        />
      )}
      {fromSpectrum.length > 0 && (
        <Typography variant="body2" data-testid="basis-from-spectrum">
          From the design spectrum:{' '}
          {fromSpectrum
            .map((v) => `${v.label} ${readableValue(v.value)}${v.unit ? ` ${v.unit}` : ''}`)
            .join(', ')}
          . Generate the spectrum again to change them.
        </Typography>
      )}
      {mismatches.length > 0 && (
        <Alert severity="warning" role="alert" aria-label="Basis and spectrum disagree">
          <AlertTitle>The saved basis and the design spectrum disagree</AlertTitle>
          {mismatches.map((m) => (
            <div key={m}>{m}</div>
          ))}
          {!readOnly && fromSpectrum.length > 0 && (
            <div>Save the basis to take the spectrum&apos;s values.</div>
          )}
        </Alert>
      )}
      {!readOnly && (
        <div>
          <Button type="submit" variant="outlined" disabled={saving}>
            Save the basis
          </Button>
        </div>
      )}
      <Typography variant="caption" color="text.secondary">
        Clause numbers are those of {CODE_BASIS_LABELS[code]} as the software reads them; Table
        12.8-1 and Table 12.12-1 values were entered from memory. Saving makes the stored results
        stale until the calc is analysed again.
      </Typography>
    </Stack>
  );
}
