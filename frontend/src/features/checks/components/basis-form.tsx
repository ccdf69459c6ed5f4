import { Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { CODE_BASIS_LABELS, CODE_BASES, type CodeBasisParameters } from '@tiermode/shared-types';
import { useFormik } from 'formik';
import { useState } from 'react';
import {
  basisSchema,
  FIELDS,
  fromBasis,
  PERIOD_SYSTEMS,
  PER_LEVEL,
  perLevel,
  toBasis,
  type BasisFormValues,
} from './basis-schema';

/** The code basis and its parameters, each with the clause it comes from. */
export function BasisForm({
  basis,
  defaultCode,
  storeys,
  readOnly,
  saving,
  onSave,
}: {
  basis: CodeBasisParameters | null;
  /** The number of storeys, for the per-level list. */
  storeys: number;
  defaultCode: CodeBasisParameters['code'];
  readOnly: boolean;
  saving: boolean;
  onSave: (basis: CodeBasisParameters) => void;
}) {
  const [code, setCode] = useState<CodeBasisParameters['code']>(basis?.code ?? defaultCode);
  const form = useFormik<BasisFormValues>({
    initialValues: fromBasis(basis, code),
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
    onSubmit: (values) => onSave(toBasis(values, storeys)),
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
              void form.setFieldValue('ct', String(system.ct));
              void form.setFieldValue('x', String(system.x));
            }
          }}
          helperText="ASCE 7-22 Table 12.8-2 (SI, from memory)"
          sx={{ maxWidth: 420 }}
        >
          {PERIOD_SYSTEMS.map((s) => (
            <MenuItem key={s.label} value={s.label}>
              {s.label} (Ct {s.ct}, x {s.x})
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
            label={field.label}
            value={form.values[field.name] ?? ''}
            onChange={form.handleChange}
            onBlur={form.handleBlur}
            error={Boolean(form.touched[field.name] && form.errors[field.name])}
            helperText={(form.touched[field.name] && form.errors[field.name]) || field.clause}
            disabled={readOnly}
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
          label={PER_LEVEL[code].label}
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
