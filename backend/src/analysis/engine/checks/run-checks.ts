import {
  spectrumBasisMismatches,
  type AnalysisResponse,
  type Asce7Basis,
  type ChecksRequest,
  type ChecksResponse,
  type DesignStoreyValues,
  type En1998Basis,
  type StoreyCheck,
  type UserBasis,
} from '@tiermode/shared-types';
import { analyse } from '../analyse';
import { naturalModes } from '../modes';
import { STANDARD_GRAVITY } from '../modal-response';
import { EN1998_GROUND_PARAMETERS } from '../spectrum-generators';
import { allowableDriftRatio, amplifiedDrift, stabilityCoefficient } from './asce7-drift';
import {
  approximatePeriod,
  distributionExponent,
  elfPeriod,
  modalScaleFactor,
  seismicResponseCoefficient,
  upperLimitCoefficient,
  verticalDistribution,
} from './asce7-elf';
import { en1998CloselySpaced, en1998DriftLimitRatio, en1998ModeCountCheck } from './en1998';
import { verticalIrregularities } from './irregularity';

type Combined = AnalysisResponse['combined']['cqc'];

/** Gravity load at and above each storey (N), taken as the seismic weight there (common practice). */
const loadAbove = (weights: readonly number[]) =>
  weights.map((_, i) => weights.slice(i).reduce((a, b) => a + b, 0));

/**
 * The code-basis checks of one analysis (method.md, "Code-basis checks"): the ELF comparison and
 * scaling, design drifts against the limit, the stability coefficient per storey, and the
 * vertical irregularities of the storey table. Pure; throws RangeError naming the field.
 */
export function runChecks(request: ChecksRequest): {
  analysis: AnalysisResponse;
  checks: ChecksResponse;
} {
  const analysis = analyse(request, naturalModes, request.basis.code);
  const combined = analysis.combined[request.combination ?? 'cqc'];
  // Every check divides by the modal base shear (the scale factor V / Vt, theta's storey shear,
  // the drift scaling): with none there is nothing to check, and no number to give.
  if (!(combined.baseShear > 0)) {
    throw new RangeError(
      'spectrum gives no base shear: Sa is zero at the periods of every mode, so the code-basis checks cannot be made; check the spectrum table',
    );
  }
  const { storeys } = request;
  const masses = storeys.map((s) => s.mass);
  const irregularities = verticalIrregularities(
    storeys.map((s) => s.stiffness),
    masses,
    combined.driftRatio,
  );
  const basis = request.basis;
  const checks =
    basis.code === 'ASCE7-22'
      ? asce7(request, basis, analysis, combined)
      : basis.code === 'EN1998-1'
        ? en1998(request, basis, analysis, combined)
        : userDefined(request, basis, analysis, combined);
  // The basis and the spectrum must be one site's: a generated spectrum's SDS, ag, q... that the
  // basis does not share would give checks of another building than the one analysed.
  const warnings = spectrumBasisMismatches(basis, request.spectrum.source);
  const design = designValues(basis, checks, combined, request.combination ?? 'cqc');
  return { analysis, checks: { ...checks, irregularities, warnings, design } };
}

/**
 * The design storey values: the combined values the checks use, reduced and scaled as the basis
 * says. Forces and displacements scale linearly, so each combined quantity takes the factor.
 */
function designValues(
  basis: ChecksRequest['basis'],
  checks: BasisChecks,
  combined: Combined,
  combination: DesignStoreyValues['combination'],
): DesignStoreyValues {
  let analysisValues: DesignStoreyValues['analysisValues'] = 'elastic';
  let forceFactor: number;
  let displacementFactor: number;
  let explanation: string;
  if (basis.code === 'ASCE7-22') {
    const reduction = basis.r / basis.ie;
    forceFactor = checks.scaleFactor / reduction;
    displacementFactor = (basis.cd / basis.ie / reduction) * checks.driftScaleFactor;
    explanation = `Design forces = elastic / (R / Ie) x ${checks.scaleFactor.toPrecision(4)} (ASCE 7-22 12.9.1.2, 12.9.1.4.1); design displacements = elastic / (R / Ie) x Cd / Ie${checks.driftScaleFactor > 1 ? ` x ${checks.driftScaleFactor.toPrecision(4)} (12.9.1.4.2)` : ''} (12.8.6, 12.9.1.2).`;
  } else if (basis.code === 'EN1998-1') {
    analysisValues = 'design';
    forceFactor = 1;
    displacementFactor = basis.q;
    explanation = `The design spectrum (EN 1998-1 3.2.2.5) already includes q, so the analysis gives the design forces; design displacements d_s = q d_e with q = ${basis.q} (4.3.4).`;
  } else {
    forceFactor = basis.scaleFactor;
    displacementFactor = basis.deflectionAmplification;
    explanation = `Design forces = elastic x the basis's scale factor ${basis.scaleFactor}; design displacements = elastic x its deflection amplification ${basis.deflectionAmplification} (user-defined).`;
  }
  const times = (values: number[], factor: number) => values.map((v) => v * factor);
  return {
    analysisValues,
    combination,
    forceFactor,
    displacementFactor,
    explanation,
    floorForce: times(combined.floorForce, forceFactor),
    storeyShear: times(combined.storeyShear, forceFactor),
    overturningMoment: times(combined.overturningMoment, forceFactor),
    displacement: times(combined.displacement, displacementFactor),
    drift: times(combined.drift, displacementFactor),
  };
}

type BasisChecks = Omit<ChecksResponse, 'irregularities'>;

function asce7(
  request: ChecksRequest,
  basis: Asce7Basis,
  analysis: AnalysisResponse,
  combined: Combined,
): BasisChecks {
  const { storeys } = request;
  const weights = basis.seismicWeights ?? storeys.map((s) => s.mass * STANDARD_GRAVITY);
  if (weights.length !== storeys.length) {
    throw new RangeError(`basis.seismicWeights must have one value per storey (${storeys.length})`);
  }
  const weight = weights.reduce((a, b) => a + b, 0);
  const hn = basis.hn ?? storeys.reduce((sum, s) => sum + s.height, 0);
  const computedPeriod = analysis.modes[0].period;
  const ta = approximatePeriod(basis.ct, basis.x, hn);
  const { period, capped } = elfPeriod(computedPeriod, ta, upperLimitCoefficient(basis.sd1));
  const cs = seismicResponseCoefficient({ ...basis, period });
  const baseShear = cs.cs * weight;
  const reduction = basis.r / basis.ie;
  const modalBaseShear = combined.baseShear / reduction;
  const scaleFactor = modalScaleFactor(baseShear, modalBaseShear);
  // 12.9.1.4.2: drifts are scaled only where Vt is below Cs W with Cs from Eq. 12.8-6.
  const nearFault = cs.values['12.8-6'];
  const driftScaleFactor =
    nearFault !== null && modalBaseShear < nearFault * weight
      ? (nearFault * weight) / modalBaseShear
      : 1;
  const limit = allowableDriftRatio(basis.riskCategory);
  const above = loadAbove(weights);
  let elevation = 0;
  const elevations = storeys.map((s) => (elevation += s.height));
  const elfForces = verticalDistribution(
    weights,
    elevations,
    baseShear,
    distributionExponent(period),
  );
  const storeyChecks: StoreyCheck[] = storeys.map((s, i) => {
    // 12.9.1.2: the analysis used the unreduced spectrum, so the elastic drift is divided by
    // R/Ie, then amplified by Cd/Ie (12.8.6).
    const designDrift =
      amplifiedDrift(combined.drift[i] / reduction, basis.cd, basis.ie) * driftScaleFactor;
    const modalShear = combined.storeyShear[i] / reduction;
    const scaledShear = modalShear * scaleFactor;
    const stability = stabilityCoefficient({
      gravityLoad: above[i],
      designDrift,
      ie: basis.ie,
      storeyShear: scaledShear,
      storeyHeight: s.height,
      cd: basis.cd,
    });
    return {
      storey: i + 1,
      designDriftRatio: designDrift / s.height,
      driftLimitRatio: limit,
      driftOk: designDrift / s.height <= limit,
      theta: stability.value.theta,
      thetaMax: stability.value.thetaMax,
      stabilityOk: stability.pass,
      pDelta: stability.value.consequence,
      elfForce: elfForces[i],
      modalShear,
      scaledShear,
    };
  });
  const notes = [
    `ELF base shear V = Cs W = ${cs.cs.toFixed(4)} x W with Cs from Eq. ${cs.governs} (ASCE 7-22 12.8.1.1), T = ${period.toFixed(3)} s${capped ? ` (the computed ${computedPeriod.toFixed(3)} s capped at Cu Ta, 12.8.2)` : ''}.`,
    scaleFactor > 1
      ? `The modal base shear is below V: forces are scaled by V / Vt = ${scaleFactor.toFixed(3)} (12.9.1.4.1).`
      : 'The modal base shear is at least V: no scaling of forces (12.9.1.4.1).',
    driftScaleFactor > 1
      ? `Drifts are scaled by ${driftScaleFactor.toFixed(3)}: Vt is below Cs W with Cs from Eq. 12.8-6 (12.9.1.4.2).`
      : 'Drifts are not scaled (12.9.1.4.2).',
    'Theta uses the seismic weight at and above each storey as its gravity load (common practice; use the factored vertical design load where it differs).',
  ];
  return {
    code: basis.code,
    elf: {
      period,
      computedPeriod,
      approximatePeriod: ta,
      capped,
      cs: cs.cs,
      csGoverns: `Eq. ${cs.governs}`,
      baseShear,
      weight,
      clause: 'ASCE 7-22 12.8',
    },
    modalBaseShear,
    scaleFactor,
    driftScaleFactor,
    storeys: storeyChecks,
    notes,
  };
}

function en1998(
  request: ChecksRequest,
  basis: En1998Basis,
  analysis: AnalysisResponse,
  combined: Combined,
): BasisChecks {
  const { storeys } = request;
  const masses = basis.seismicMasses ?? storeys.map((s) => s.mass);
  if (masses.length !== storeys.length) {
    throw new RangeError(`basis.seismicMasses must have one value per storey (${storeys.length})`);
  }
  const weights = masses.map((m) => m * STANDARD_GRAVITY);
  const weight = weights.reduce((a, b) => a + b, 0);
  const first = analysis.modes[0];
  const tc = EN1998_GROUND_PARAMETERS[basis.spectrumType][basis.groundType][2];
  // 4.3.3.2.2: Fb = Sd(T1) m lambda, lambda = 0.85 where T1 <= 2 TC and there are more than two storeys.
  const lambda = first.period <= 2 * tc && storeys.length > 2 ? 0.85 : 1;
  const baseShear = first.sa * weight * lambda;
  const limit = en1998DriftLimitRatio(basis.driftLimitClass);
  const above = loadAbove(weights);
  const storeyChecks: StoreyCheck[] = storeys.map((s, i) => {
    // 4.3.4: d_s = q d_e; 4.4.3.2: d_r nu <= limit h.
    const designDrift = basis.q * combined.drift[i];
    const ratio = (designDrift * basis.nu) / s.height;
    // 4.4.2.2: theta = P_tot d_r / (V_tot h).
    const theta = (above[i] * designDrift) / (combined.storeyShear[i] * s.height);
    return {
      storey: i + 1,
      designDriftRatio: ratio,
      driftLimitRatio: limit,
      driftOk: ratio <= limit,
      theta,
      thetaMax: 0.3,
      stabilityOk: theta <= 0.3,
      pDelta:
        theta <= 0.1
          ? 'may be neglected'
          : theta <= 0.2
            ? 'amplify by 1/(1 - theta)'
            : theta <= 0.3
              ? 'needs a second-order analysis'
              : 'exceeds the limit',
      elfForce: null,
      modalShear: combined.storeyShear[i],
      scaledShear: combined.storeyShear[i],
    };
  });
  const modeCount = en1998ModeCountCheck(
    analysis.modes.map((m) => m.effectiveMassRatio),
    analysis.modes.length,
  );
  const needed = modeCount.value.needed;
  const close = en1998CloselySpaced(
    analysis.modes.map((m) => m.period),
    request.combination ?? 'cqc',
  );
  return {
    code: basis.code,
    elf: {
      period: first.period,
      computedPeriod: first.period,
      approximatePeriod: null,
      capped: false,
      cs: first.sa * lambda,
      csGoverns: null,
      baseShear,
      weight,
      clause: 'EN 1998-1:2004 4.3.3.2.2',
    },
    modalBaseShear: combined.baseShear,
    scaleFactor: 1,
    driftScaleFactor: 1,
    storeys: storeyChecks,
    notes: [
      `Lateral force method base shear Fb = Sd(T1) m lambda with lambda = ${lambda} (4.3.3.2.2), for comparison; EN 1998-1 does not scale the modal results to it.`,
      needed === null
        ? 'The modes used do not reach 90% of the mass (4.3.3.3.1).'
        : needed <= analysis.modes.length
          ? `${needed} mode(s) reach 90% of the mass with every mode above 5% (4.3.3.3.1); ${analysis.modes.length} are used.`
          : `At least ${needed} modes are needed (4.3.3.3.1).`,
      close.value.pairs.length === 0
        ? 'No two consecutive modes are closely spaced (4.3.3.3.2).'
        : `Modes ${close.value.pairs.map(([i, j]) => `${i} and ${j}`).join(', ')} are closely spaced (T_j > 0.9 T_i, 4.3.3.3.2): ${close.pass ? 'CQC combines them, as it should' : 'SRSS is not acceptable for them; use CQC'}.`,
      'Theta uses the seismic weight at and above each storey as P_tot (common practice).',
    ],
  };
}

function userDefined(
  request: ChecksRequest,
  basis: UserBasis,
  analysis: AnalysisResponse,
  combined: Combined,
): BasisChecks {
  const { storeys } = request;
  const weights = storeys.map((s) => s.mass * STANDARD_GRAVITY);
  const above = loadAbove(weights);
  const storeyChecks: StoreyCheck[] = storeys.map((s, i) => {
    const designDrift = combined.drift[i] * basis.deflectionAmplification;
    const scaledShear = combined.storeyShear[i] * basis.scaleFactor;
    const theta = (above[i] * designDrift) / (scaledShear * s.height);
    return {
      storey: i + 1,
      designDriftRatio: designDrift / s.height,
      driftLimitRatio: basis.driftLimitRatio,
      driftOk: designDrift / s.height <= basis.driftLimitRatio,
      theta,
      thetaMax: basis.stabilityLimit,
      stabilityOk: theta <= basis.stabilityLimit,
      pDelta: theta <= basis.stabilityLimit ? 'within the limit' : 'exceeds the limit',
      elfForce: null,
      modalShear: combined.storeyShear[i],
      scaledShear,
    };
  });
  return {
    code: basis.code,
    elf: {
      period: analysis.modes[0].period,
      computedPeriod: analysis.modes[0].period,
      approximatePeriod: null,
      capped: false,
      cs: 0,
      csGoverns: null,
      baseShear: combined.baseShear * basis.scaleFactor,
      weight: weights.reduce((a, b) => a + b, 0),
      clause: 'user-defined',
    },
    modalBaseShear: combined.baseShear,
    scaleFactor: basis.scaleFactor,
    driftScaleFactor: 1,
    storeys: storeyChecks,
    notes: [
      'User-defined basis: the scale factor, drift limit and stability limit are the engineer’s.',
    ],
  };
}
