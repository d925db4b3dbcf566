import { randomBytes } from 'node:crypto';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { Db } from '../../server/db/tables';

/** A design file saved under the uploads folder the way the hub stores them. */
export async function saveDesign(uploadsDir: string, svg: string): Promise<string> {
  const dir = path.join(uploadsDir, 'designs');
  await mkdir(dir, { recursive: true });
  const file = `${randomBytes(16).toString('hex')}.svg`;
  await writeFile(path.join(dir, file), svg);
  return file;
}

/** A film colour, a cutter with its cut station, and a customer of this test's own, so no other test shares them. */
export async function cutWorld(db: Db) {
  const tag = randomBytes(3).toString('hex');
  const type = (await db('film_types').where({ name: 'Standard PU 90 µm' }).first())!;
  const [filmId] = await db('films').insert({ film_type_id: type.id, colour: `Test teal ${tag}`, colour_hex: '#2A8C82' });
  const [secondFilmId] = await db('films').insert({ film_type_id: type.id, colour: `Test plum ${tag}`, colour_hex: '#6B2D5C' });
  const [cutterId] = await db('cutters').insert({
    name: `Test cutter ${tag}`,
    carriage_width_mm: 610,
    min_media_mm: 305,
    max_media_mm: 508,
    blade_installed_at: new Date(Date.now() - 5 * 86_400_000),
    blade_distance_mm: 10_000,
    last_test_cut_at: new Date(Date.now() - 86_400_000),
    distance_at_last_test_mm: 10_000,
    last_film_type_id: type.id,
  });
  const stationName = `Cut T${tag}`;
  await db('stations').insert({ name: stationName, kind: 'cut', cutter_id: cutterId! });
  const [customerId] = await db('customers').insert({ name: `Test customer ${tag}`, notes: '' });
  const fabric = (await db('fabrics').first('id'))!;
  let serial = 0;

  /** A roll of a film on the rack. */
  async function roll(film: number, widthMm: number, lengthMm: number, remainingMm: number, reorderMm = 2000): Promise<number> {
    serial += 1;
    const [id] = await db('rolls').insert({ film_id: film, label: `T${tag}-${serial}`, width_mm: widthMm, length_mm: lengthMm, remaining_mm: remainingMm, reorder_mm: reorderMm, rack_slot: `Z${serial}` });
    return id!;
  }

  /** An open order with one job on the given layer films and one queued bag per entry of `bagPieces`. */
  async function job(opts: { widthMm: number; heightMm: number; rotate: boolean; films: number[]; bagPieces: number[]; designFile?: string | null }): Promise<number[]> {
    serial += 1;
    const code = `T${tag}${serial}`;
    const [orderId] = await db('orders').insert({ code, customer_id: customerId!, due_at: new Date(Date.now() + 86_400_000), notes: '' });
    const [jobId] = await db('jobs').insert({
      order_id: orderId!,
      name: `Test job ${serial}`,
      design_file: opts.designFile ?? null,
      design_mime: opts.designFile ? 'image/svg+xml' : null,
      design_width_mm: opts.widthMm,
      design_height_mm: opts.heightMm,
      placement: 'full_front',
      garment: 'Tee',
      fabric_id: fabric.id,
      quantities: db.raw('?', [JSON.stringify({ M: opts.bagPieces.reduce((a, b) => a + b, 0) })]) as never,
      rotation_allowed: opts.rotate,
    });
    await db('job_layers').insert(opts.films.map((film, i) => ({ job_id: jobId!, position: i + 1, film_id: film })));
    const ids: number[] = [];
    for (const [i, pieces] of opts.bagPieces.entries()) {
      const [bagId] = await db('bags').insert({
        order_id: orderId!,
        job_id: jobId!,
        code: `${code}-${String.fromCharCode(65 + i)}`,
        token: randomBytes(32).toString('base64url'),
        sizes: db.raw('?', [JSON.stringify({ M: pieces })]) as never,
        pieces,
      });
      ids.push(bagId!);
    }
    return ids;
  }

  return { tag, filmTypeId: type.id, filmId: filmId!, secondFilmId: secondFilmId!, cutterId: cutterId!, stationName, roll, job };
}
