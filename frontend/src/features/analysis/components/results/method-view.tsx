import { ScrollFrame } from '@/components/data-display/scroll-frame';
import {
  Box,
  MenuItem,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import {
  shapeNormalisationNote,
  STANDARD_GRAVITY,
  type AnalysisSummary,
  type StoreyInput,
} from '@tiermode/shared-types';
import { useState } from 'react';
import { useInView } from 'react-intersection-observer';
import { useWholeAnalysis, type ModalDetailSource } from '../../api/modal-detail';
import { DetailStatus } from './detail-status';
import { formatNumber, toDisplay, unitLabel, type UnitSystem } from '@/lib/units';

/** Up to this many storeys M and K are written out in full; above it, row by row in band form. */
const FULL_MATRIX_STOREYS = 8;
const G = STANDARD_GRAVITY;
/** 1 kip s^2/in = 4448.2216152605 N / 0.0254 m/s^2, in kg: the US mass unit that pairs with kip/in. */
const KIP_S2_PER_IN = 4448.2216152605 / 0.0254;

const mono = { fontFamily: 'monospace' } as const;

function Matrix({ label, values }: { label: string; values: string[][] }) {
  return (
    <Box sx={{ minWidth: 0, maxWidth: '100%' }}>
      <Typography variant="subtitle2">{label}</Typography>
      <ScrollFrame label={`${label}, scrolling`} maxHeight={380}>
        <Table size="small" aria-label={label} sx={{ width: 'auto' }}>
          <TableBody>
            {values.map((row, i) => (
              <TableRow key={i}>
                {row.map((v, j) => (
                  <TableCell key={j} align="right" sx={mono}>
                    {v}
                  </TableCell>
                ))}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </ScrollFrame>
    </Box>
  );
}

/**
 * The method step by step, for a building of any height: M and K (in full for a few storeys,
 * row by row in band form for more, scrolling inside their frame), every mode's omega^2, T,
 * Gamma, M*, Sa and base shear, then any one mode worked level by level (L, M_n, Gamma, M*, the
 * floor forces and displacements), and how the combined base shears follow from the modal ones.
 */
export function MethodView({
  storeys: rows,
  result,
  detail,
  units,
}: {
  storeys: StoreyInput[];
  result: AnalysisSummary;
  /** Where the worked mode's floor forces and displacements come from, once it is on view. */
  detail: ModalDetailSource;
  units: UnitSystem;
}) {
  const [modeNumber, setModeNumber] = useState(result.modes[0]?.number ?? 1);
  const { ref, inView } = useInView({ triggerOnce: true, rootMargin: '400px 0px' });
  const fetched = useWholeAnalysis(result, detail, inView);
  const n = rows.length;
  const us = units === 'US';
  const massUnit = us ? 'kip·s²/in' : 't';
  const mass = (kg: number) => (us ? kg / KIP_S2_PER_IN : kg / 1000);
  const stiffness = (nPerM: number) => toDisplay(units, 'stiffness', nPerM);
  const kUnit = unitLabel(units, 'stiffness');
  const force = unitLabel(units, 'force');
  const length = unitLabel(units, 'displacement');
  // K_ii = k_i + k_(i+1), K_(i,i+1) = K_(i+1,i) = -k_(i+1): the shear building's matrix.
  const kAt = (i: number, j: number) =>
    i === j
      ? rows[i].stiffness + (i + 1 < n ? rows[i + 1].stiffness : 0)
      : Math.abs(i - j) === 1
        ? -rows[Math.max(i, j)].stiffness
        : 0;
  const mode = result.modes.find((m) => m.number === modeNumber) ?? result.modes[0];
  const response = fetched.whole?.modes.find((m) => m.number === mode?.number)?.response;
  const a = mode ? mode.sa * G : 0;
  const products = mode ? rows.map((r, i) => r.mass * mode.shape[i]) : [];
  const l = products.reduce((sum, v) => sum + v, 0);
  const mn = mode ? rows.reduce((sum, r, i) => sum + r.mass * mode.shape[i] ** 2, 0) : 0;

  return (
    <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'minmax(0, 1fr)' }}>
      <Typography>
        Storey 1 is the first row and column. M is in {massUnit} and K in {kUnit}, so ω² comes out
        in 1/s²; ground motion is along the building, r = [1 … 1]. Solve K φ = ω² M φ; for each mode
        n with φ normalised to 1 at the roof, L = φᵀ M r, Mₙ = φᵀ M φ, Γ = L / Mₙ and M* = L² / Mₙ;
        Aₙ = Sa(Tₙ) g and the modal base shear is M* Aₙ.
      </Typography>
      {n <= FULL_MATRIX_STOREYS ? (
        <Box sx={{ display: 'flex', gap: 4, flexWrap: 'wrap' }}>
          <Matrix
            label={`M (${massUnit})`}
            values={rows.map((r, i) =>
              rows.map((_, j) => (i === j ? formatNumber(mass(r.mass)) : '0')),
            )}
          />
          <Matrix
            label={`K (${kUnit})`}
            values={rows.map((_, i) => rows.map((__, j) => formatNumber(stiffness(kAt(i, j)))))}
          />
        </Box>
      ) : (
        <Box>
          <Typography variant="subtitle2">
            M and K row by row ({n} storeys). M is diagonal and K tridiagonal: every entry not shown
            is 0.
          </Typography>
          <ScrollFrame label="M and K by row, scrolling" maxHeight={380}>
            <Table size="small" stickyHeader aria-label="M and K by row">
              <TableHead>
                <TableRow>
                  <TableCell>Row i</TableCell>
                  <TableCell align="right">Mᵢᵢ ({massUnit})</TableCell>
                  <TableCell align="right">Kᵢ,ᵢ₋₁ ({kUnit})</TableCell>
                  <TableCell align="right">Kᵢᵢ ({kUnit})</TableCell>
                  <TableCell align="right">Kᵢ,ᵢ₊₁ ({kUnit})</TableCell>
                </TableRow>
              </TableHead>
              <TableBody>
                {rows.map((r, i) => (
                  <TableRow key={i}>
                    <TableCell>{i + 1}</TableCell>
                    <TableCell align="right" sx={mono}>
                      {formatNumber(mass(r.mass))}
                    </TableCell>
                    <TableCell align="right" sx={mono}>
                      {i > 0 ? formatNumber(stiffness(kAt(i, i - 1))) : '—'}
                    </TableCell>
                    <TableCell align="right" sx={mono}>
                      {formatNumber(stiffness(kAt(i, i)))}
                    </TableCell>
                    <TableCell align="right" sx={mono}>
                      {i + 1 < n ? formatNumber(stiffness(kAt(i, i + 1))) : '—'}
                    </TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          </ScrollFrame>
        </Box>
      )}
      <ScrollFrame label="Modal values, scrolling" maxHeight={380}>
        <Table size="small" stickyHeader aria-label="Modal values">
          <TableHead>
            <TableRow>
              <TableCell>Mode</TableCell>
              <TableCell align="right">ω² (1/s²)</TableCell>
              <TableCell align="right">T (s)</TableCell>
              <TableCell align="right">Γ</TableCell>
              <TableCell align="right">M* ({massUnit})</TableCell>
              <TableCell align="right">Sa (g)</TableCell>
              <TableCell align="right">Aₙ (m/s²)</TableCell>
              <TableCell align="right">Base shear ({force})</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {result.modes.map((m) => (
              <TableRow key={m.number}>
                <TableCell>{m.number}</TableCell>
                <TableCell align="right">{formatNumber(m.circularFrequency ** 2)}</TableCell>
                <TableCell align="right">{m.period.toFixed(4)}</TableCell>
                <TableCell align="right">
                  {formatNumber(m.participationFactor)}
                  {shapeNormalisationNote(m) && ` (${shapeNormalisationNote(m)})`}
                </TableCell>
                <TableCell align="right">{formatNumber(mass(m.effectiveMass))}</TableCell>
                <TableCell align="right">{m.sa.toFixed(4)}</TableCell>
                <TableCell align="right">{formatNumber(m.sa * G)}</TableCell>
                <TableCell align="right">
                  {formatNumber(toDisplay(units, 'force', m.baseShear))}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </ScrollFrame>

      {mode && (
        <Box
          ref={ref}
          component="section"
          aria-label="One mode, step by step"
          sx={{ display: 'grid', gap: 1, gridTemplateColumns: 'minmax(0, 1fr)' }}
        >
          <TextField
            select
            size="small"
            label="Mode worked step by step"
            value={mode.number}
            onChange={(e) => setModeNumber(Number(e.target.value))}
            sx={{ maxWidth: 320 }}
          >
            {result.modes.map((m) => (
              <MenuItem key={m.number} value={m.number}>
                Mode {m.number} (T = {formatNumber(m.period)} s)
              </MenuItem>
            ))}
          </TextField>
          <Typography>
            1. ω² = {formatNumber(mode.circularFrequency ** 2)} 1/s², so ω ={' '}
            {formatNumber(mode.circularFrequency)} rad/s and T = 2π / ω = {mode.period.toFixed(4)}{' '}
            s.
          </Typography>
          <Typography>
            2. With φ as below ({shapeNormalisationNote(mode) || '+1 at the roof'}): L = Σ mᵢ φᵢ ={' '}
            {formatNumber(mass(l))} and Mₙ = Σ mᵢ φᵢ² = {formatNumber(mass(mn))} {massUnit}.
          </Typography>
          <Typography>
            3. Γ = L / Mₙ = {formatNumber(l / mn)}; M* = L² / Mₙ ={' '}
            {formatNumber(mass((l * l) / mn))} {massUnit},{' '}
            {formatNumber(mode.effectiveMassRatio * 100)}% of the mass.
          </Typography>
          <Typography>
            4. Sa({mode.period.toFixed(4)} s) = {mode.sa.toFixed(4)} g from the spectrum, so Aₙ ={' '}
            {formatNumber(a)} m/s².
          </Typography>
          <Typography>
            5. Floor forces fᵢ = Γ mᵢ φᵢ Aₙ and displacements uᵢ = Γ φᵢ Aₙ / ω²; their sum, the base
            shear, is M* Aₙ = {formatNumber(toDisplay(units, 'force', mode.baseShear))} {force}.
          </Typography>
          {!response && <DetailStatus loading={fetched.loading} error={fetched.error} />}
          {response && (
            <ScrollFrame label={`Mode ${mode.number}, level by level, scrolling`} maxHeight={380}>
              <Table size="small" stickyHeader aria-label={`Mode ${mode.number}, level by level`}>
                <TableHead>
                  <TableRow>
                    <TableCell>Level</TableCell>
                    <TableCell align="right">mᵢ ({massUnit})</TableCell>
                    <TableCell align="right">φᵢ</TableCell>
                    <TableCell align="right">mᵢ φᵢ</TableCell>
                    <TableCell align="right">mᵢ φᵢ²</TableCell>
                    <TableCell align="right">fᵢ ({force})</TableCell>
                    <TableCell align="right">uᵢ ({length})</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {rows.map((r, i) => (
                    <TableRow key={i}>
                      <TableCell>{i + 1}</TableCell>
                      <TableCell align="right">{formatNumber(mass(r.mass))}</TableCell>
                      <TableCell align="right">{formatNumber(mode.shape[i])}</TableCell>
                      <TableCell align="right">{formatNumber(mass(products[i]))}</TableCell>
                      <TableCell align="right">
                        {formatNumber(mass(r.mass * mode.shape[i] ** 2))}
                      </TableCell>
                      <TableCell align="right">
                        {formatNumber(toDisplay(units, 'force', response.floorForce[i]))}
                      </TableCell>
                      <TableCell align="right">
                        {formatNumber(toDisplay(units, 'displacement', response.displacement[i]))}
                      </TableCell>
                    </TableRow>
                  ))}
                  <TableRow>
                    <TableCell colSpan={3}>Sum</TableCell>
                    <TableCell align="right">{formatNumber(mass(l))}</TableCell>
                    <TableCell align="right">{formatNumber(mass(mn))}</TableCell>
                    <TableCell align="right">
                      {formatNumber(toDisplay(units, 'force', mode.baseShear))}
                    </TableCell>
                    <TableCell />
                  </TableRow>
                </TableBody>
              </Table>
            </ScrollFrame>
          )}
        </Box>
      )}
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
