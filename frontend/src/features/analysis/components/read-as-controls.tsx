import { MenuItem, Stack, TextField, Typography } from '@mui/material';
import {
  DECIMAL_MARK_WORDS,
  DELIMITER_WORDS,
  type DecimalMark,
  type Delimiter,
} from '@tiermode/shared-types';
import type { ReadAs, ReadOptions } from '../model/paste';

const FOUND = 'found';

/**
 * "Read as: columns separated by tabs, decimal comma (1.234,5)", with each part changeable: the
 * separator and the decimal mark found in the pasted text unless the person picks one.
 */
export function ReadAsControls({
  readAs,
  options,
  onChange,
}: {
  readAs: ReadAs;
  options: ReadOptions;
  onChange: (options: ReadOptions) => void;
}) {
  const decimalWords = readAs.decimal
    ? DECIMAL_MARK_WORDS[readAs.decimal]
    : 'not settled by any cell';
  return (
    <Stack spacing={1} sx={{ mt: 2 }}>
      <Typography data-testid="read-as">
        Read as: columns separated by {DELIMITER_WORDS[readAs.delimiter]}, {decimalWords}.
      </Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <TextField
          select
          size="small"
          label="Columns separated by"
          value={options.delimiter ?? FOUND}
          onChange={(e) =>
            onChange({
              ...options,
              delimiter: e.target.value === FOUND ? undefined : (e.target.value as Delimiter),
            })
          }
          sx={{ minWidth: 220 }}
        >
          <MenuItem value={FOUND}>As found in the text</MenuItem>
          {(Object.keys(DELIMITER_WORDS) as Delimiter[]).map((d) => (
            <MenuItem key={d} value={d}>
              {DELIMITER_WORDS[d]}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          select
          size="small"
          label="Numbers"
          value={options.decimal ?? FOUND}
          onChange={(e) =>
            onChange({
              ...options,
              decimal: e.target.value === FOUND ? undefined : (e.target.value as DecimalMark),
            })
          }
          sx={{ minWidth: 260 }}
        >
          <MenuItem value={FOUND}>As found in the text</MenuItem>
          {(Object.keys(DECIMAL_MARK_WORDS) as DecimalMark[]).map((d) => (
            <MenuItem key={d} value={d}>
              {DECIMAL_MARK_WORDS[d]}
            </MenuItem>
          ))}
        </TextField>
      </Stack>
    </Stack>
  );
}
