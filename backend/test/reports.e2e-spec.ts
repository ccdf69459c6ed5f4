import type { CalculationDto } from '@tiermode/shared-types';
import { formats } from '../src/reports/formats';
import { binaryBody, useSignedInApp } from './support/fixtures';
import { pdfText } from './support/pdf-text';

const { http, as } = useSignedInApp();

async function packageOf(id: string, role: 'designer' | 'student' = 'designer') {
  const res = await http()
    .get(`/api/calculations/${id}/report.pdf`)
    .set(as(role))
    .buffer(true)
    .parse(binaryBody)
    .expect(200)
    .expect('Content-Type', 'application/pdf');
  return res.body as Buffer;
}

describe('GET /api/calculations/:id/report.pdf', () => {
  let locked: CalculationDto;
  let submitted: CalculationDto;

  beforeAll(async () => {
    const list = await http().get('/api/calculations').set(as('designer')).expect(200);
    const find = async (status: string) =>
      (
        await http()
          .get(
            `/api/calculations/${(list.body as { id: string; status: string }[]).find((c) => c.status === status)!.id}`,
          )
          .set(as('designer'))
      ).body as CalculationDto;
    locked = await find('locked');
    submitted = await find('submitted');
  });

  it('is a PDF whose text has the title, revision, periods and combined base shear as shown', async () => {
    const bytes = await packageOf(locked.id);
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    const { text, pages } = await pdfText(bytes);
    expect(pages).toBeGreaterThan(3);
    expect(text).toContain(locked.title);
    expect(text).toContain(`revision ${locked.revision}`);
    for (const mode of locked.analysis!.modes) expect(text).toContain(formats.period(mode.period));
    expect(text).toContain(formats.kN(locked.analysis!.combined.cqc.baseShear));
    expect(text).toContain(formats.kN(locked.analysis!.combined.srss.baseShear));
    expect(text).toMatch(new RegExp(`page 1 of ${pages}`));
  });

  it('carries the seal hash, signature and key of a locked calc, and no PRELIMINARY mark', async () => {
    const { text } = await pdfText(await packageOf(locked.id, 'student'));
    expect(text).toContain(locked.seal!.hash);
    // pdf-parse breaks the long base64 signature over two lines: compare without spaces.
    expect(text.replace(/\s+/g, '')).toContain(locked.seal!.signature!);
    expect(text).toContain(`Signing key id ${locked.seal!.keyId}`);
    expect(text).toContain('matched the seal');
    expect(text).toContain('"tiermode-seal:" followed by the');
    expect(text).not.toContain('PRELIMINARY');
  });

  it('marks every page of a calc that is not locked PRELIMINARY, and has no seal', async () => {
    const { text, pages } = await pdfText(await packageOf(submitted.id));
    expect(text.match(/PRELIMINARY/g)?.length).toBeGreaterThanOrEqual(pages);
    expect(text).toContain('Not locked: there is no seal');
  });

  it('is refused to a student for a calc that is not locked', async () => {
    await http().get(`/api/calculations/${submitted.id}/report.pdf`).set(as('student')).expect(403);
  });
});

describe('the calc package of a calc with checks', () => {
  it('carries the stored checks, drift by drift', async () => {
    const list = await http().get('/api/calculations?status=draft').set(as('designer')).expect(200);
    const draft = (list.body as { id: string; title: string; version: number }[]).find((c) =>
      c.title.startsWith('Loading-dock'),
    )!;
    const current = await http().get(`/api/calculations/${draft.id}`).set(as('designer'));
    await http()
      .patch(`/api/calculations/${draft.id}`)
      .set(as('designer'))
      .send({
        version: current.body.version,
        basis: {
          code: 'USER',
          scaleFactor: 1.1,
          driftLimitRatio: 0.01,
          deflectionAmplification: 4,
          stabilityLimit: 0.25,
        },
      })
      .expect(200);
    await http().post(`/api/calculations/${draft.id}/analyse`).set(as('designer')).expect(200);
    const { text } = await pdfText(await packageOf(draft.id));
    expect(text).toContain('Scale factors');
    expect(text).toContain('forces 1.100');
    expect(text).toMatch(/EXCEEDS/);
  });

  it('is written in the units asked for, with the spectrum source and the design storey values', async () => {
    const list = await http().get('/api/calculations?status=draft').set(as('designer')).expect(200);
    const draft = (list.body as { id: string; title: string }[]).find((c) =>
      c.title.startsWith('Loading-dock'),
    )!;
    const pdf = await http()
      .get(`/api/calculations/${draft.id}/report.pdf?units=US`)
      .set(as('designer'))
      .buffer(true)
      .parse(binaryBody)
      .expect(200);
    const { text } = await pdfText(pdf.body as Buffer);
    const flat = text.replace(/\s+/g, ' ');
    expect(flat).toContain('Seismic weight (kip)');
    expect(flat).toContain('Storey shear (kip)');
    expect(flat).not.toContain('(kN)');
    expect(flat).toContain(
      'Source: ASCE 7 two-period (11.4.6): SDS 0.8 g, SD1 0.45 g, TL 6 s, S1 0.4 g.',
    );
    expect(flat).toContain('Storey values for design (CQC)');
    expect(flat).toContain('elastic');
    expect(flat).toContain('Combined responses (SRSS), storey by storey');
    expect(flat).toContain('Mode 1 alone');
    await http()
      .get(`/api/calculations/${draft.id}/report.pdf?units=imperial`)
      .set(as('designer'))
      .expect(400);
  });
});
