import { ScrollFrame } from '@/components/data-display/scroll-frame';
import {
  Autocomplete,
  Box,
  Chip,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import { shapeNormalisationNote, type ModeSummary, type StoreyInput } from '@tiermode/shared-types';
import { useState } from 'react';
import { formatNumber, toDisplay, unitLabel, type UnitSystem } from '@/lib/units';
import { elevations as elevationsOf } from '../../model/storey-rows';
import { ModeShapeChart } from './mode-shape-chart';
import { SwayAnimation } from './sway-animation';

const label = (m: ModeSummary) => `Mode ${m.number} (T = ${formatNumber(m.period)} s)`;

/**
 * Mode shapes: any modes chosen, drawn against elevation, their values level by level for any
 * height (the table scrolls inside its frame), and the building swaying in them.
 */
export function ModeShapesPanel({
  modes,
  storeys,
  units,
}: {
  modes: ModeSummary[];
  storeys: StoreyInput[];
  units: UnitSystem;
}) {
  const [chosen, setChosen] = useState<number[]>(() => modes.slice(0, 3).map((m) => m.number));
  const shown = modes.filter((m) => chosen.includes(m.number));
  const levels = elevationsOf(storeys).slice(0, modes[0]?.shape.length);
  const notes = shown.filter((m) => shapeNormalisationNote(m));
  return (
    <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'minmax(0, 1fr)' }}>
      <Autocomplete
        multiple
        size="small"
        options={modes}
        value={shown}
        getOptionLabel={label}
        isOptionEqualToValue={(a, b) => a.number === b.number}
        onChange={(_, value) => setChosen(value.map((m) => m.number))}
        renderValue={(value, getItemProps) =>
          value.map((m, index) => {
            const { key, ...props } = getItemProps({ index });
            return <Chip key={key} size="small" label={`Mode ${m.number}`} {...props} />;
          })
        }
        renderInput={(params) => (
          <TextField {...params} label="Modes shown" placeholder="Add a mode" />
        )}
        sx={{ maxWidth: 640 }}
      />
      {shown.length === 0 ? (
        <Typography color="text.secondary">
          Choose one or more modes to see their shapes.
        </Typography>
      ) : (
        <Box sx={{ display: 'flex', flexWrap: 'wrap', gap: 2 }}>
          <Box sx={{ flex: '1 1 420px', minWidth: 0 }}>
            <ModeShapeChart modes={shown} elevations={levels} units={units} />
          </Box>
          <SwayAnimation modes={shown} elevations={levels} />
        </Box>
      )}
      {shown.length > 0 && (
        <ScrollFrame label="Mode shape values, scrolling" maxHeight={420}>
          <Table size="small" stickyHeader aria-label="Mode shape values">
            <TableHead>
              <TableRow>
                <TableCell>Level</TableCell>
                <TableCell align="right">Elevation ({unitLabel(units, 'length')})</TableCell>
                {shown.map((m) => (
                  <TableCell key={m.number} align="right">
                    φ, mode {m.number}
                  </TableCell>
                ))}
              </TableRow>
            </TableHead>
            <TableBody>
              {levels
                .map((h, i) => ({ h, i }))
                .reverse()
                .map(({ h, i }) => (
                  <TableRow key={i}>
                    <TableCell>
                      {i + 1}
                      {storeys[i]?.label ? ` ${storeys[i].label}` : ''}
                    </TableCell>
                    <TableCell align="right">
                      {formatNumber(toDisplay(units, 'length', h))}
                    </TableCell>
                    {shown.map((m) => (
                      <TableCell key={m.number} align="right">
                        {formatNumber(m.shape[i])}
                      </TableCell>
                    ))}
                  </TableRow>
                ))}
            </TableBody>
          </Table>
        </ScrollFrame>
      )}
      <Typography variant="caption" color="text.secondary">
        Shapes are +1 at the roof
        {notes.length > 0
          ? `, except ${notes.map((m) => `mode ${m.number} (${shapeNormalisationNote(m)})`).join(', ')}`
          : ''}
        . The roof is the top row of the table.
      </Typography>
    </Box>
  );
}
