import type TestAgent from 'supertest/lib/agent';
import { signedInOperator, signedInPerson, testApp } from './support/test-hub';

const hub = testApp();
let operator: TestAgent;
let lead: TestAgent;
const ids = { airPress: 0, manualPress: 0, nylon: 0, glitterGold: 0, standardWhite: 0, standardRed: 0 };

async function filmId(type: string, colour: string): Promise<number> {
  const film = await hub.db('films').join('film_types', 'film_types.id', 'films.film_type_id').where('film_types.name', type).andWhere('films.colour', colour).first('films.id');
  return film!.id;
}

beforeAll(async () => {
  operator = (await signedInOperator(hub.app, hub.db, 'Press 2', 1)).agent;
  lead = await signedInPerson(hub.app, 'lead');
  ids.airPress = (await hub.db('presses').where({ name: 'Air press 16 x 20' }).first('id'))!.id;
  ids.manualPress = (await hub.db('presses').where({ name: 'Clamshell 15 x 15' }).first('id'))!.id;
  ids.nylon = (await hub.db('fabrics').where({ name: 'Nylon' }).first('id'))!.id;
  ids.glitterGold = await filmId('Glitter 200 µm', 'Gold glitter');
  ids.standardWhite = await filmId('Standard PU 90 µm', 'White');
  ids.standardRed = await filmId('Standard PU 90 µm', 'Red');
});
afterAll(() => hub.close());

async function bagId(code: string): Promise<number> {
  return (await hub.db('bags').where({ code }).first('id'))!.id;
}

describe('POST /api/press-cards', () => {
  it('gives the two-layer hoodie bag a tack for the white outline and the full dwell for the red lettering', async () => {
    const res = await operator.post('/api/press-cards').send({ bagId: await bagId('1044-A'), pressId: ids.airPress }).expect(200);
    // Seeded recipe for Standard PU on 50/50 cotton-poly: 150 °C, 12 s, medium, warm peel, 3 s pre-press, 2 s tack.
    expect(res.body.steps).toEqual([
      { filmId: ids.standardWhite, seconds: 2, kind: 'tack' },
      { filmId: ids.standardRed, seconds: 12, kind: 'dwell' },
    ]);
    expect(res.body).toMatchObject({ temperatureC: 150, temperatureF: 302, dwellS: 12, prePressS: 3, pressureClass: 'medium', peel: 'warm', totalHeatS: 17 });
    // Stored platen 406 x 508 mm = 15.984 x 20 in = 319.69 in²; bore 76.2 mm = 3 in, π x 1.5² = 7.0686 in².
    // Medium = 1.0 psi on the platen (rule of thumb): 1.0 x 319.69 / 7.0686 = 45.23 psi on the gauge, 319.7 lbf;
    // 45.23 psi x 6.894 757 = 311.8 kPa and 319.69 lbf x 4.448 222 = 1422.0 N (NIST SP 811, appendix B.8).
    expect(res.body.gauge).toEqual({ gaugePsi: 45.2, gaugeKPa: 311.8, platenPsi: 1, forceLbf: 319.7, forceN: 1422 });
    expect(res.body.warnings).toEqual([]);
    expect(res.body.cautions).toEqual(expect.arrayContaining([expect.stringMatching(/Hot platen/), expect.stringMatching(/Pinch point/)]));
    expect(res.body.sources).toEqual(expect.arrayContaining([expect.stringMatching(/supplier/)]));
  });

  it("shows the class and the press's note, without a gauge, on the manual press", async () => {
    const res = await lead.post('/api/press-cards').send({ bagId: await bagId('1044-B'), pressId: ids.manualPress }).expect(200);
    expect(res.body.gauge).toBeUndefined();
    expect(res.body.pressureClass).toBe('medium');
    expect(res.body.press.note).toMatch(/knob on top/);
  });

  it("warns on the tote bag order when the seeded heat per garment is over a lowered shop limit", async () => {
    const before = (await hub.db('shop_settings').where({ id: 1 }).first('heat_exposure_limit_s'))!.heat_exposure_limit_s;
    await hub.db('shop_settings').where({ id: 1 }).update({ heat_exposure_limit_s: 15 });
    try {
      // Low-temp PU on nylon: 3 s pre-press + 10 s dwell + 3 s second press = 16 s.
      const res = await operator.post('/api/press-cards').send({ bagId: await bagId('1045-A'), pressId: ids.manualPress }).expect(200);
      expect(res.body.totalHeatS).toBe(16);
      expect(res.body.warnings).toContain("Each garment gets 16 s of heat in all, more than the shop's limit of 15 s: the fabric may scorch, shine or bleed. Check with a lead before pressing.");
    } finally {
      await hub.db('shop_settings').where({ id: 1 }).update({ heat_exposure_limit_s: before });
    }
  });

  it('answers an unknown bag with 404 and a sentence', async () => {
    const res = await operator.post('/api/press-cards').send({ bagId: 999999, pressId: ids.airPress }).expect(404);
    expect(res.body.error).toMatch(/There is no bag 999999/);
  });

  it('answers a missing bag id with 400 naming the field', async () => {
    const res = await operator.post('/api/press-cards').send({ pressId: ids.airPress }).expect(400);
    expect(res.body.details).toEqual([expect.objectContaining({ path: 'bagId' })]);
  });

  it("answers 400 when the pressure class needs more than the press's rated gauge", async () => {
    const [pressId] = await hub.db('presses').insert({
      name: 'Test air press, weak gauge', kind: 'air', platen_width_mm: 406, platen_height_mm: 508, bore_mm: '76.20', max_gauge_kpa: '206.84', notes: '',
    });
    try {
      const res = await operator.post('/api/press-cards').send({ bagId: await bagId('1044-A'), pressId }).expect(400);
      expect(res.body.error).toMatch(/Medium pressure needs more than this press gives\. .* above the 30 psi \(207 kPa\)/);
    } finally {
      await hub.db('presses').where({ id: pressId }).delete();
    }
  });
});

describe('POST /api/press-cards/preview', () => {
  it("caps standard film on nylon at the fabric's maximum and suggests the low-temperature film", async () => {
    const res = await operator.post('/api/press-cards/preview').send({ layers: [ids.standardWhite], fabricId: ids.nylon, pressId: ids.manualPress }).expect(200);
    expect(res.body).toMatchObject({ temperatureC: 130, temperatureF: 266, capped: true });
    expect(res.body.warnings[0]).toMatch(/Standard PU 90 µm asks for 302 °F \(150 °C\), but Nylon takes at most 266 °F \(130 °C\)/);
    expect(res.body.suggestions).toEqual([expect.objectContaining({ filmTypeName: 'Low-temp PU 80 µm', tempC: 125 })]);
  });

  it('answers 422 naming the film type and fabric when the Recipe book has no recipe for them', async () => {
    const res = await operator.post('/api/press-cards/preview').send({ layers: [ids.glitterGold], fabricId: ids.nylon, pressId: ids.manualPress }).expect(422);
    expect(res.body.error).toMatch(/The Recipe book has no recipe for Glitter 200 µm on Nylon\./);
    expect(res.body.details).toEqual([{ path: 'layers', message: 'No recipe for Glitter 200 µm on Nylon.' }]);
  });

  it('answers an empty layer list with 400 and a sentence', async () => {
    const res = await operator.post('/api/press-cards/preview').send({ layers: [], fabricId: ids.nylon, pressId: ids.manualPress }).expect(400);
    expect(res.body.error).toMatch(/at least one layer/);
  });

  it('answers an unknown film with 404 and a sentence', async () => {
    const res = await operator.post('/api/press-cards/preview').send({ layers: [999999], fabricId: ids.nylon, pressId: ids.manualPress }).expect(404);
    expect(res.body.error).toMatch(/There is no film 999999/);
  });
});

describe('POST /api/press-cards/gauge', () => {
  it('gives 424.1 lbf and 1.885 psi for a 3 in bore at 60 psi on a 15 x 15 in platen', async () => {
    // Worked by hand: π x 1.5² = 7.0686 in² x 60 psi = 424.1 lbf; 424.1 / 225 in² = 1.885 psi.
    // 424.12 lbf x 4.448 222 N/lbf = 1886.6 N (NIST SP 811, appendix B.8).
    const res = await operator.post('/api/press-cards/gauge').send({ boreIn: 3, platenWidthIn: 15, platenHeightIn: 15, gaugePsi: 60 }).expect(200);
    expect(res.body).toMatchObject({ platenPsi: 1.885, forceLbf: 424.1, forceN: 1886.6 });
    expect(res.body.targetGaugePsi).toBeUndefined();
  });

  it('gives the gauge setting for the same platen pressure on a smaller sleeve platen', async () => {
    // Worked by hand: same bore, so 60 psi x (5 x 15) / (15 x 15) = 60 x 75 / 225 = 20 psi.
    const res = await operator.post('/api/press-cards/gauge').send({ boreIn: 3, platenWidthIn: 15, platenHeightIn: 15, gaugePsi: 60, target: { platenWidthIn: 5, platenHeightIn: 15 } }).expect(200);
    expect(res.body.targetGaugePsi).toBe(20);
  });

  it('answers a zero bore with 400 and a sentence', async () => {
    const res = await operator.post('/api/press-cards/gauge').send({ boreIn: 0, platenWidthIn: 15, platenHeightIn: 15, gaugePsi: 60 }).expect(400);
    expect(res.body.error).toMatch(/boreIn must be more than zero inches/);
  });

  it('answers a negative platen size with 400 and a sentence', async () => {
    const res = await operator.post('/api/press-cards/gauge').send({ boreIn: 3, platenWidthIn: -15, platenHeightIn: 15, gaugePsi: 60 }).expect(400);
    expect(res.body.error).toMatch(/platenWidthIn must be more than zero inches/);
  });

  it("answers a gauge above the press's rated maximum with 400 and a sentence", async () => {
    const res = await operator.post('/api/press-cards/gauge').send({ boreIn: 3, platenWidthIn: 15, platenHeightIn: 15, gaugePsi: 110, maxGaugePsi: 100 }).expect(400);
    expect(res.body.error).toMatch(/110\.0 psi .* is above the 100 psi .* that the press is rated for/);
  });
});

describe('GET /api/presses', () => {
  it('lists the presses with decimals as numbers', async () => {
    const res = await operator.get('/api/presses').expect(200);
    const air = res.body.find((p: { name: string }) => p.name === 'Air press 16 x 20');
    expect(air).toMatchObject({ kind: 'air', boreMm: 76.2, maxGaugeKpa: 689.48, platenWidthMm: 406, platenHeightMm: 508 });
  });
});
