import { Box, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import {
  shapeNormalisationNote,
  type AnalysisResponse,
  type StoreyInput,
} from '@tiermode/shared-types';
import { formatNumber, toDisplay, unitLabel, type UnitSystem } from '@/lib/units';

const MAX_STOREYS_SHOWN = 6;
const G = 9.80665;

function Matrix({ label, values }: { label: string; values: string[][] }) {
  return (
    <Box>
      <Typography variant="subtitle2">{label}</Typography>
      <Table size="small" aria-label={label} sx={{ width: 'auto' }}>
        <TableBody>
          {values.map((row, i) => (
            <TableRow key={i}>
              {row.map((v, j) => (
                <TableCell key={j} align="right" sx={{ fontFamily: 'monospace' }}>
                  {v}
                </TableCell>
              ))}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Box>
  );
}

/**
 * Every step for a small building: M and K as entered, then each mode's omega^2, Gamma and M*,
 * Sa and its base shear, and how the combined base shears follow from the modal ones.
 */
export function MethodView({
  storeys: rows,
  result,
  units,
}: {
  storeys: StoreyInput[];
  result: AnalysisResponse;
  units: UnitSystem;
}) {
  if (rows.length > MAX_STOREYS_SHOWN) {
    return (
      <Typography>
        The step-by-step view is shown for buildings of up to {MAX_STOREYS_SHOWN} storeys; the
        tables above hold every value for this one.
      </Typography>
    );
  }
  const n = rows.length;
  // M = diag(m_i); K_ii = k_i + k_(i+1), K_(i,i+1) = -k_(i+1) (the shear-building matrices).
  const m = rows.map((r, i) => rows.map((_, j) => (i === j ? formatNumber(r.mass / 1000) : '0')));
  const k = rows.map((_, i) =>
    rows.map((__, j) => {
      const value =
        i === j
          ? rows[i].stiffness + (i + 1 < n ? rows[i + 1].stiffness : 0)
          : Math.abs(i - j) === 1
            ? -rows[Math.max(i, j)].stiffness
            : 0;
      return formatNumber(value / 1000);
    }),
  );
  const force = unitLabel(units, 'force');
  const vb = result.modes.map((mode) => mode.response.baseShear);
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Typography>
        Storey 1 is the first row and column. M is in t and K in kN/m; ground motion is along the
        building, r = [1 … 1]. Solve K φ = ω² M φ; for each mode n with φ normalised to 1 at the
        roof, L = φᵀ M r, Mₙ = φᵀ M φ, Γ = L / Mₙ and M* = L² / Mₙ; Aₙ = Sa(Tₙ) g and the modal base
        shear is M* Aₙ.
      </Typography>
      <Box sx={{ display: 'flex', gap: 4, flexWrap: 'wrap' }}>
        <Matrix label="M (t)" values={m} />
        <Matrix label="K (kN/m)" values={k} />
      </Box>
      <Table size="small" aria-label="Modal values">
        <TableHead>
          <TableRow>
            <TableCell>Mode</TableCell>
            <TableCell align="right">ω² (rad²/s²)</TableCell>
            <TableCell align="right">T (s)</TableCell>
            <TableCell align="right">φ (roof = 1 unless noted), storey 1 → roof</TableCell>
            <TableCell align="right">Γ</TableCell>
            <TableCell align="right">M* (t)</TableCell>
            <TableCell align="right">Sa (g)</TableCell>
            <TableCell align="right">Aₙ (m/s²)</TableCell>
            <TableCell align="right">Base shear ({force})</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {result.modes.map((mode, i) => (
            <TableRow key={mode.number}>
              <TableCell>{mode.number}</TableCell>
              <TableCell align="right">{formatNumber(mode.circularFrequency ** 2)}</TableCell>
              <TableCell align="right">{mode.period.toFixed(4)}</TableCell>
              <TableCell align="right">
                {mode.shape.map((v) => formatNumber(v)).join(', ')}
                {shapeNormalisationNote(mode) && ` (${shapeNormalisationNote(mode)})`}
              </TableCell>
              <TableCell align="right">{formatNumber(mode.participationFactor)}</TableCell>
              <TableCell align="right">{formatNumber(mode.effectiveMass / 1000)}</TableCell>
              <TableCell align="right">{mode.sa.toFixed(4)}</TableCell>
              <TableCell align="right">{formatNumber(mode.sa * G)}</TableCell>
              <TableCell align="right">{formatNumber(toDisplay(units, 'force', vb[i]))}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Typography>
        Combined base shear: SRSS = √(Σ Vₙ²) ={' '}
        {formatNumber(toDisplay(units, 'force', result.combined.srss.baseShear))} {force}; CQC =
        √(Σᵢ Σⱼ ρᵢⱼ Vᵢ Vⱼ) ={' '}
        {formatNumber(toDisplay(units, 'force', result.combined.cqc.baseShear))} {force}; ABS = Σ
        |Vₙ| = {formatNumber(toDisplay(units, 'force', result.combined.abs.baseShear))} {force}.
        Each response is combined on its own from its modal values, never from other combined
        values.
      </Typography>
    </Box>
  );
}
