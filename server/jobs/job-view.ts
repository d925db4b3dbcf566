import type { JobDetail, RosterLine, Size, SizeQuantities } from '../../src/shared/intake-contract';
import { countPieces } from '../../src/shared/intake/bag-split';
import type { RosterLineRow } from '../db/tables';
import type { JobRecord } from './jobs-repository';

/** The URL a stored design is served from. */
export const designUrl = (file: string) => `/api/designs/${file}`;

/** A roster line row as the API shows it. */
export const toRosterLine = (row: RosterLineRow): RosterLine => ({
  id: row.id,
  name: row.name,
  number: row.number,
  size: row.size as Size,
  extraText: row.extra_text,
  bagId: row.bag_id,
});

/** A job record as the API shows it. */
export function toJobDetail({ job, fabric, layers, rosterLines }: JobRecord): JobDetail {
  const quantities = job.quantities as SizeQuantities;
  return {
    id: job.id,
    name: job.name,
    design: job.design_file ? { file: job.design_file, mime: job.design_mime ?? '', url: designUrl(job.design_file) } : null,
    designWidthMm: job.design_width_mm,
    designHeightMm: job.design_height_mm,
    placement: job.placement,
    offsetXMm: job.offset_x_mm,
    offsetYMm: job.offset_y_mm,
    garment: job.garment,
    fabric: { id: fabric.id, name: fabric.name, maxTempC: fabric.max_temp_c },
    layers: layers.map((layer) => ({
      position: layer.position,
      filmId: layer.film_id,
      filmName: layer.film_type_name,
      colour: layer.colour,
      colourHex: layer.colour_hex,
    })),
    quantities,
    pieces: countPieces(quantities),
    personalised: Boolean(job.personalised),
    rotationAllowed: Boolean(job.rotation_allowed),
    rosterLines: rosterLines.map(toRosterLine),
  };
}
