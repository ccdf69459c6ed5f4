import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { ConfigService } from '@nestjs/config';
import { MikroORM } from '@mikro-orm/knex';
import type { CalculationDto } from '@tiermode/shared-types';
import { binaryBody, sampleInputs, useSignedInApp, ONE_PAGE_PDF } from './support/fixtures';

const { state, http, as } = useSignedInApp();

// The smallest well-formed files of each kind (invented content).
const PDF = ONE_PAGE_PDF;
// A complete 1 x 1 PNG (signature, IHDR, IDAT, IEND; ISO/IEC 15948).
const PNG = Buffer.from(
  '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000b49444154789c6360000200000500017a5eab3f0000000049454e44ae426082',
  'hex',
);

async function draft(): Promise<CalculationDto> {
  const project = await http().post('/api/projects').set(as('designer')).send({ name: 'Files' });
  const calc = await http()
    .post(`/api/projects/${project.body.id}/calculations`)
    .set(as('designer'))
    .send({ title: 'With files', inputs: sampleInputs() })
    .expect(201);
  return calc.body as CalculationDto;
}

const attach = (
  calcId: string,
  bytes: Buffer,
  name: string,
  role: 'designer' | 'reviewer' = 'designer',
) =>
  http().post(`/api/calculations/${calcId}/attachments`).set(as(role)).attach('file', bytes, name);

describe('Attachments', () => {
  it('keeps a PDF with its SHA-256 under a name of the server’s, and gives it back unchanged', async () => {
    const calc = await draft();
    const res = await attach(calc.id, PDF, '../../etc/geotech letter.pdf').expect(201);
    const [file] = (res.body as CalculationDto).attachments;
    expect(file).toMatchObject({
      fileName: 'geotech letter.pdf',
      contentType: 'application/pdf',
      size: PDF.length,
      sha256: createHash('sha256').update(PDF).digest('hex'),
      uploadedBy: { name: 'Mira Castell' },
    });
    const stored = await state.app
      .get(MikroORM)
      .em.getConnection()
      .execute<{ stored_name: string }[]>('select stored_name from attachments where id = ?', [
        file.id,
      ]);
    expect(stored[0].stored_name).toMatch(/^[0-9a-f-]{36}\.pdf$/);
    const back = await http()
      .get(`/api/attachments/${file.id}`)
      .set(as('student'))
      .buffer(true)
      .parse(binaryBody);
    // A student may not read a draft's files.
    expect(back.status).toBe(403);
    const mine = await http()
      .get(`/api/attachments/${file.id}`)
      .set(as('reviewer'))
      .buffer(true)
      .parse(binaryBody)
      .expect(200)
      .expect('Content-Type', 'application/pdf');
    expect(Buffer.compare(mine.body as Buffer, PDF)).toBe(0);
  });

  it('judges the type by content and refuses anything but PDF, PNG and JPEG', async () => {
    const calc = await draft();
    const renamed = await attach(calc.id, Buffer.from('just text'), 'drawing.pdf').expect(400);
    expect(renamed.body.message[0]).toContain('file must be a PDF, PNG or JPEG');
    const big = await attach(
      calc.id,
      Buffer.concat([PNG, Buffer.alloc(10 * 1024 * 1024)]),
      'x.png',
    );
    expect(big.status).toBe(400);
    expect(big.body.message).toEqual(['file must be at most 10 MB']);
    await attach(calc.id, PNG, 'plan.png').expect(201);
  });

  it('refuses polyglots: an image that is also a ZIP, a PDF with a script, markup in a PNG', async () => {
    const calc = await draft();
    const zipTail = Buffer.from('504b0506000000000000000000000000000000000000', 'hex');
    const imageZip = await attach(calc.id, Buffer.concat([PNG, zipTail]), 'plan.png').expect(400);
    expect(imageZip.body.message).toEqual(['file has other data after the end of the PNG']);
    const scripted = Buffer.from(
      ONE_PAGE_PDF.toString('latin1').replace(
        '/Type/Catalog',
        '/Type/Catalog/OpenAction<</S/J#61vaScript/JS(app.alert(1))>>',
      ),
      'latin1',
    );
    const pdf = await attach(calc.id, scripted, 'letter.pdf').expect(400);
    expect(pdf.body.message).toEqual([
      'file contains JavaScript (/JavaScript), which is not kept with a calc; print it to a plain PDF first',
    ]);
    const linked = Buffer.from(
      ONE_PAGE_PDF.toString('latin1').replace(
        '/Type/Catalog',
        '/Type/Catalog/OpenAction<</S/URI/URI(https://example.test)>>',
      ),
      'latin1',
    );
    expect((await attach(calc.id, linked, 'letter.pdf').expect(400)).body.message).toEqual([
      'file contains a web link (/URI), which is not kept with a calc; print it to a plain PDF first',
    ]);
    const page = Buffer.concat([
      PNG.subarray(0, 33),
      Buffer.from('<html><script>x()</script>'),
      PNG.subarray(33),
    ]);
    const markup = await attach(calc.id, page, 'plan.png').expect(400);
    expect(markup.body.message).toEqual(['file carries web-page markup (<html…) near its start']);
    const after = await http().get(`/api/calculations/${calc.id}`).set(as('designer')).expect(200);
    expect(after.body.attachments).toEqual([]);
  });

  it('lets only the project’s designers attach, and never to a calc under review or locked', async () => {
    const calc = await draft();
    await attach(calc.id, PDF, 'a.pdf', 'reviewer').expect(403);
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200);
    await attach(calc.id, PDF, 'under-review.pdf').expect(409);
    await http()
      .post(`/api/calculations/${calc.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Accepted.' })
      .expect(200);
    const locked = await attach(calc.id, PDF, 'late.pdf').expect(409);
    expect(locked.body.message[0]).toContain('can never change');
  });

  it('seals the attachment’s hash with the calc: a changed file record breaks the seal', async () => {
    const calc = await draft();
    const withFile = await attach(calc.id, PDF, 'letter.pdf').expect(201);
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200);
    await http()
      .post(`/api/calculations/${calc.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Accepted with the letter.' })
      .expect(200);
    const valid = await http().get(`/api/calculations/${calc.id}/seal`).set(as('reviewer'));
    expect(valid.body.valid).toBe(true);
    await state.app
      .get(MikroORM)
      .em.getConnection()
      .execute('update attachments set sha256 = ? where id = ?', [
        '0'.repeat(64),
        (withFile.body as CalculationDto).attachments[0].id,
      ]);
    const broken = await http().get(`/api/calculations/${calc.id}/seal`).set(as('reviewer'));
    expect(broken.body.valid).toBe(false);
  });
});

describe('File names, and taking files and drafts back', () => {
  const history = async (id: string) =>
    (await state.app
      .get(MikroORM)
      .em.getConnection()
      .execute('select action, detail from audit_events where calculation_id = ? order by seq', [
        id,
      ])) as { action: string; detail: string | null }[];

  it('keeps a file name in UTF-8, and gives it back in the download header (RFC 8187)', async () => {
    const calc = await draft();
    const res = await attach(calc.id, PDF, 'Übersicht-Straße.pdf').expect(201);
    const [file] = (res.body as CalculationDto).attachments;
    expect(file.fileName).toBe('Übersicht-Straße.pdf');
    const back = await http().get(`/api/attachments/${file.id}`).set(as('designer')).expect(200);
    expect(back.headers['content-disposition']).toContain(
      "filename*=UTF-8''%C3%9Cbersicht-Stra%C3%9Fe.pdf",
    );
  });

  it('lets the draft’s author remove an attachment, with the file and on the audit trail', async () => {
    const calc = await draft();
    const added = await attach(calc.id, PDF, 'old letter.pdf').expect(201);
    const [file] = (added.body as CalculationDto).attachments;
    const [{ stored_name: storedName }] = (await state.app
      .get(MikroORM)
      .em.getConnection()
      .execute('select stored_name from attachments where id = ?', [file.id])) as {
      stored_name: string;
    }[];
    const onDisk = join(state.app.get(ConfigService).get<string>('attachmentsDir')!, storedName);
    expect(existsSync(onDisk)).toBe(true);
    await http().delete(`/api/attachments/${file.id}`).set(as('reviewer')).expect(403);
    const removed = await http()
      .delete(`/api/attachments/${file.id}`)
      .set(as('designer'))
      .expect(200);
    expect((removed.body as CalculationDto).attachments).toEqual([]);
    await http().get(`/api/attachments/${file.id}`).set(as('designer')).expect(404);
    expect(existsSync(onDisk)).toBe(false);
    const events = await history(calc.id);
    expect(events.map((e) => e.action)).toEqual(['created', 'attached', 'attachment removed']);
    expect(JSON.parse(events[2].detail!)).toEqual({
      fileName: 'old letter.pdf',
      sha256: createHash('sha256').update(PDF).digest('hex'),
    });
  });

  it('keeps attachments once the calc is submitted', async () => {
    const calc = await draft();
    const added = await attach(calc.id, PDF, 'letter.pdf').expect(201);
    const [file] = (added.body as CalculationDto).attachments;
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200);
    const refused = await http()
      .delete(`/api/attachments/${file.id}`)
      .set(as('designer'))
      .expect(409);
    expect(refused.body.message[0]).toMatch(/submitted for review/);
  });

  it('lets the author delete a scratch draft, never one that went to review', async () => {
    const scratch = await draft();
    await attach(scratch.id, PDF, 'letter.pdf').expect(201);
    await http().delete(`/api/calculations/${scratch.id}`).set(as('reviewer')).expect(403);
    await http().delete(`/api/calculations/${scratch.id}`).set(as('designer')).expect(204);
    await http().get(`/api/calculations/${scratch.id}`).set(as('designer')).expect(404);
    const events = await history(scratch.id);
    expect(events.map((e) => e.action)).toEqual(['created', 'attached', 'deleted']);
    expect(JSON.parse(events[2].detail!)).toMatchObject({ title: 'With files', revision: 1 });

    const reviewed = await draft();
    await http().post(`/api/calculations/${reviewed.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${reviewed.id}/submit`).set(as('designer')).expect(200);
    await http()
      .post(`/api/calculations/${reviewed.id}/return`)
      .set(as('reviewer'))
      .send({ comment: 'Check storey 2.' })
      .expect(200);
    const kept = await http()
      .delete(`/api/calculations/${reviewed.id}`)
      .set(as('designer'))
      .expect(409);
    expect(kept.body.message).toEqual([
      'This draft went to review once, so it is kept with its review; only a draft never submitted can be deleted',
    ]);
  });
});
