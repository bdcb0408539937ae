import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';

import { WREN, WREN_LOADS } from '@/shared/demo/scenario';
import { withHousehold } from './fixtures';

// The sheet's text is read back with poppler's pdftotext and its paper with pdfinfo (Debian's
// poppler-utils, installed by scripts/lib.sh), so the test reads the PDF as a reader would.
let wrenId: string;
const dir = mkdtempSync(path.join(tmpdir(), 'keyoff-sheet-'));

const binary = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const parts: Buffer[] = [];
  res.on('data', (c: Buffer) => parts.push(c));
  res.on('end', () => cb(null, Buffer.concat(parts)));
};
function poppler(tool: 'pdftotext' | 'pdfinfo', pdf: Buffer) {
  const file = path.join(dir, `${Math.random().toString(36).slice(2)}.pdf`);
  writeFileSync(file, pdf);
  return execFileSync(tool, tool === 'pdftotext' ? ['-layout', file, '-'] : [file], { encoding: 'utf8' });
}

const { ctx, fx } = withHousehold();
beforeAll(async () => {
  const { loads: _l, ...power } = WREN;
  const res = await fx.agents.owner.post('/api/rigs').send({ name: 'Wren', vehicle: '2011 long-wheelbase panel van', power, loads: WREN_LOADS });
  wrenId = res.body.id;
});

describe('GET /api/rigs/:rigId/sheet.pdf', () => {
  it('carries the rig, its headline figures, routine, loads, Fixes, assumptions and cautions, as the Outlook has them', async () => {
    const outlook = (await fx.agents.owner.get(`/api/rigs/${wrenId}/outlook`)).body;
    const res = await fx.agents.owner.get(`/api/rigs/${wrenId}/sheet.pdf`).buffer(true).parse(binary).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe('attachment; filename="wren-budget-sheet.pdf"');
    const text = poppler('pdftotext', res.body).replace(/\s+/g, ' ');
    expect(text).toContain('Wren: budget sheet');
    expect(text).toContain(`Days parked (to the cut-off, no driving) ${outlook.parked.daysToCutoff.toFixed(1)} days`);
    expect(text).toContain('Days on your routine');
    expect(text).toMatch(new RegExp(`Margin for a 5-day stay (Comfortable|Tight|Short)`));
    expect(text).toContain(outlook.margin.state === 'short' ? 'Short' : outlook.margin.state === 'tight' ? 'Tight' : 'Comfortable');
    // Wren's one 40-minute drive on Wednesday is its own routine, named and described.
    expect(text).toContain('Your own routine: 40 min on Wed from 11:00');
    for (const l of WREN_LOADS) expect(text).toContain(l.name);
    expect(text).toContain('Cut-off switch on the inverter');
    expect(text).toContain('How this was worked out');
    expect(text).toContain('Home Power');
    expect(text).toContain('qualified auto electrician');
    expect(text).toContain('not a guarantee');
    // Wren's 300 W inverter: its hook-up plan, the feed at 300 W / (10.5 V x 0.9) = 31.75 A near the cut-out
    // (REFERENCES.md: inverters and their switching, common practice), as GET /hookup plans it.
    expect(text).toContain('Hook-up plan');
    expect(text).toContain('Feed: 31.75 A');
    expect(text).toContain("The inverter maker's own fuse and cable instructions come first.");
  });

  it("states energy in the reader's unit: watt-hours at the system voltage once the account chose them", async () => {
    const outlook = (await fx.agents.owner.get(`/api/rigs/${wrenId}/outlook`)).body;
    await fx.agents.owner.put('/api/me/units').send({ energy: 'Wh' }).expect(200);
    try {
      const res = await fx.agents.owner.get(`/api/rigs/${wrenId}/sheet.pdf`).buffer(true).parse(binary).expect(200);
      const text = poppler('pdftotext', res.body).replace(/\s+/g, ' ');
      // Wh = Ah × the nominal voltage (energy = charge × voltage); Wren is a 12 V rig.
      const wh = (ah: number) => `${(ah * 12).toFixed(0)} Wh`;
      expect(WREN.systemVoltage).toBe(12);
      expect(text).toContain(`A day ${wh(outlook.daily.consumptionAh)} used, ${wh(outlook.daily.chargeAh)} put back`);
      expect(text).toContain('Wh a day');
      expect(text).toContain(`Standby a day: inverter idle ${wh(outlook.standby.inverterIdleAh)}`);
      expect(text).not.toContain('Ah a day');
    } finally {
      await fx.agents.owner.put('/api/me/units').send({ energy: 'Ah' }).expect(200);
    }
    // Another reader of the same rig who never chose a unit reads amp-hours.
    const member = poppler('pdftotext', (await fx.agents.member.get(`/api/rigs/${fx.rigId}/sheet.pdf`).buffer(true).parse(binary).expect(200)).body);
    expect(member).toContain('Ah a day');
  });

  it('prints on A4 by default and on Letter when asked', async () => {
    const a4 = await fx.agents.owner.get(`/api/rigs/${wrenId}/sheet.pdf`).buffer(true).parse(binary).expect(200);
    // ISO 216 A4 is 210 x 297 mm = 595.28 x 841.89 pt; US Letter is 8.5 x 11 in = 612 x 792 pt.
    expect(poppler('pdfinfo', a4.body)).toMatch(/Page size:\s+595\.2\d? x 841\.8\d? pts \(A4\)/);
    const letter = await fx.agents.owner.get(`/api/rigs/${wrenId}/sheet.pdf?size=letter`).buffer(true).parse(binary).expect(200);
    expect(poppler('pdfinfo', letter.body)).toMatch(/Page size:\s+612 x 792 pts \(letter\)/);
  });

  it('is for the household only: an outsider, an admin and a stranger to the id get 404, nobody signed in 401', async () => {
    await fx.agents.outsider.get(`/api/rigs/${fx.rigId}/sheet.pdf`).expect(404);
    await fx.agents.admin.get(`/api/rigs/${fx.rigId}/sheet.pdf`).expect(404);
    await fx.agents.owner.get('/api/rigs/00000000-0000-4000-8000-000000000000/sheet.pdf').expect(404);
    await request(ctx.app).get(`/api/rigs/${fx.rigId}/sheet.pdf`).expect(401);
    await fx.agents.advisor.get(`/api/rigs/${fx.rigId}/sheet.pdf`).expect(200);
  });

  it('refuses a paper size it does not know with a 400 naming the field', async () => {
    const res = await fx.agents.owner.get(`/api/rigs/${fx.rigId}/sheet.pdf?size=a3`).expect(400);
    expect(res.body.fields[0]).toMatchObject({ path: 'size', message: 'Choose a4 or letter.' });
  });
});
