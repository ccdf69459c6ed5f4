import type {
  AnalysisResponse,
  AnalysisSummary,
  CalculationDto,
  ModalDetail,
  WholeCalculationDto,
} from '@tiermode/shared-types';
import { joinAnalysis } from '@tiermode/shared-types';
import { sampleInputs, useSignedInApp } from './support/fixtures';

const { http, as } = useSignedInApp();

/** A building of n storeys, tapering: big enough for the answer's size to matter. */
function tower(n: number) {
  return {
    storeys: Array.from({ length: n }, (_, i) => ({
      mass: 4e5 * (1 - (0.4 * i) / n),
      stiffness: 8e8 * (1 - (0.6 * i) / n),
      height: i === 0 ? 4.5 : 3.5,
    })),
    spectrum: sampleInputs().spectrum,
    dampingRatio: 0.05,
  };
}

describe('Lean analysis answers (detail=summary | full)', () => {
  it('answers POST /api/analysis whole by default (the contract) and lean on request', async () => {
    const body = tower(40);
    const whole = (await http().post('/api/analysis').set(as('student')).send(body).expect(200))
      .body as AnalysisResponse;
    expect(whole.correlation).toHaveLength(40);
    expect(whole.modes[3].response.storeyShear).toHaveLength(40);

    const res = await http()
      .post('/api/analysis?detail=summary')
      .set(as('student'))
      .send(body)
      .expect(200);
    const summary = res.body as AnalysisSummary;
    expect(summary.detail).toBe('summary');
    expect(summary).not.toHaveProperty('correlation');
    expect(summary.modes[0]).not.toHaveProperty('response');
    // Everything else is the same numbers, and each mode keeps its base shear.
    expect(summary.combined).toEqual(whole.combined);
    expect(summary.modes.map((m) => m.period)).toEqual(whole.modes.map((m) => m.period));
    expect(summary.modes.map((m) => m.shape)).toEqual(whole.modes.map((m) => m.shape));
    expect(summary.modes.map((m) => m.baseShear)).toEqual(
      whole.modes.map((m) => m.response.baseShear),
    );
    // At 40 storeys the per-mode vectors and rho are most of the bytes.
    expect(JSON.stringify(summary).length).toBeLessThan(JSON.stringify(whole).length / 3);
  });

  it('refuses a detail it does not know, naming the parameter', async () => {
    const res = await http()
      .post('/api/analysis?detail=everything')
      .set(as('designer'))
      .send(tower(3))
      .expect(400);
    expect(res.body.message).toEqual(['detail must be one of summary, full']);
    await http()
      .post('/api/analysis?detail=full&detail=summary')
      .set(as('designer'))
      .send(tower(3))
      .expect(400);
  });

  describe('a saved calc', () => {
    let id: string;
    beforeAll(async () => {
      const projectId = (
        await http().post('/api/projects').set(as('designer')).send({ name: 'Lean answers' })
      ).body.id as string;
      id = (
        await http()
          .post(`/api/projects/${projectId}/calculations`)
          .set(as('designer'))
          .send({ title: 'Thirty storeys', inputs: tower(30) })
          .expect(201)
      ).body.id as string;
    });

    it('has no modal responses before it is analysed (404 saying so)', async () => {
      const res = await http()
        .get(`/api/calculations/${id}/modal-responses`)
        .set(as('designer'))
        .expect(404);
      expect(res.body.message).toEqual(['This calculation has not been analysed yet']);
    });

    it('shows its stored analysis as a summary, the rest on its own route, the whole on request', async () => {
      const analysed = (
        await http().post(`/api/calculations/${id}/analyse`).set(as('designer')).expect(200)
      ).body as AnalysisResponse;
      // The contract's route answers whole by default; the web app asks for the summary.
      expect(analysed.correlation).toHaveLength(30);
      const lean = (
        await http()
          .post(`/api/calculations/${id}/analyse?detail=summary`)
          .set(as('designer'))
          .expect(200)
      ).body as AnalysisSummary;
      expect(lean.detail).toBe('summary');

      const calc = (await http().get(`/api/calculations/${id}`).set(as('designer')).expect(200))
        .body as CalculationDto;
      expect(calc.analysis?.detail).toBe('summary');
      expect(calc.analysis).not.toHaveProperty('correlation');
      expect(calc.analysis?.modes[0]).not.toHaveProperty('response');

      const detail = (
        await http().get(`/api/calculations/${id}/modal-responses`).set(as('designer')).expect(200)
      ).body as ModalDetail;
      expect(detail.modes).toHaveLength(30);
      expect(detail.correlation).toHaveLength(30);

      const whole = (
        await http().get(`/api/calculations/${id}?detail=full`).set(as('designer')).expect(200)
      ).body as WholeCalculationDto;
      // The summary and its detail put back together are the stored analysis, number for number.
      expect(joinAnalysis(calc.analysis!, detail)).toEqual(whole.analysis);
      expect(whole.analysis?.modes[29].response.overturningMoment).toHaveLength(30);
    });

    it('keeps the modal responses to those who may read the calc', async () => {
      // A student reads locked calcs only; this one is a draft.
      await http().get(`/api/calculations/${id}/modal-responses`).set(as('student')).expect(403);
      await http().get(`/api/calculations/${id}/modal-responses`).expect(401);
    });
  });
});
