import { readFile } from 'node:fs/promises';
import type { CutPlanEstimate } from '../../src/shared/cutting/cut-plan-contract';
import { estimateCut, LIFT_AND_MOVE_S_PER_CONTOUR, OVERCUT_PER_CLOSED_CONTOUR_MM, WEAR_FACTOR_BY_CLASS, type CutFilm } from '../../src/shared/cutting/cut-estimate';
import { svgSizeMm } from '../../src/shared/intake/design-size';
import type { DesignStore } from '../designs/design-store';
import type { QueuedLayer } from './cutting-repository';

/** One job's design to cut a number of times at the job's size. */
export interface DesignToCut {
  jobName: string;
  designFile: string | null;
  widthMm: number;
  heightMm: number;
  copies: number;
}

/** The designs of the planned bags, one entry per job with the bags' pieces added up. */
export function designsToCut(layers: readonly QueuedLayer[]): DesignToCut[] {
  const byJob = new Map<number, DesignToCut>();
  for (const layer of layers) {
    const known = byJob.get(layer.job_id);
    if (known) known.copies += layer.pieces;
    else byJob.set(layer.job_id, { jobName: layer.job_name, designFile: layer.design_file, widthMm: layer.design_width_mm, heightMm: layer.design_height_mm, copies: layer.pieces });
  }
  return [...byJob.values()];
}

/**
 * Cut length, time and blade wear for the plan. An SVG design is measured by cut-estimate at the
 * job's size (scaled from the file's own size); a PNG has no cut path, so its bounding box
 * perimeter stands in, with a warning.
 */
export async function estimatePlan(designs: readonly DesignToCut[], film: CutFilm, store: DesignStore): Promise<CutPlanEstimate> {
  const totals = { cutLengthMm: 0, contours: 0 };
  const warnings: string[] = [];
  for (const design of designs) {
    const svg = await readSvg(design.designFile, store);
    if (svg === null) {
      const why = design.designFile?.endsWith('.png') ? 'no cut path: PNG' : design.designFile ? 'no cut path: the design file is missing' : 'no cut path: no design uploaded';
      warnings.push(`"${design.jobName}": ${why}. The box's outline (${design.widthMm} x ${design.heightMm} mm) stands in for its cut length, so the estimate is rough.`);
      totals.cutLengthMm += (2 * (design.widthMm + design.heightMm) + OVERCUT_PER_CLOSED_CONTOUR_MM) * design.copies;
      totals.contours += design.copies;
      continue;
    }
    const estimate = estimateCut(svg, film, design.copies);
    const natural = svgSizeMm(svg);
    // The job's size is what is cut; a file drawn at another size scales its paths evenly.
    const scale = natural && natural.widthMm > 0 ? design.widthMm / natural.widthMm : 1;
    totals.cutLengthMm += estimate.pathLengthMm * scale + estimate.overcutMm;
    totals.contours += estimate.closedContours + estimate.openContours;
    warnings.push(...estimate.warnings.map((w) => `"${design.jobName}": ${w}`));
  }
  return {
    cutLengthMm: totals.cutLengthMm,
    cutTimeS: totals.cutLengthMm / film.cutSpeedMmS + totals.contours * LIFT_AND_MOVE_S_PER_CONTOUR,
    bladeDistanceMm: totals.cutLengthMm * WEAR_FACTOR_BY_CLASS[film.wearClass],
    warnings,
  };
}

async function readSvg(file: string | null, store: DesignStore): Promise<string | null> {
  if (!file || !file.endsWith('.svg')) return null;
  const full = await store.pathOf(file);
  return full ? readFile(full, 'utf8') : null;
}
