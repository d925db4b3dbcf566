import type {
  CutConfirmReply,
  CutConfirmRequest,
  CutGroup,
  CutGroupBag,
  CutPlanPreview,
  CutPlanRequest,
  CutPreset,
} from '../../src/shared/cutting/cut-plan-contract';
import { layoutGang } from '../../src/shared/cutting/gang-layout';
import { GangLayoutRefusal } from '../../src/shared/cutting/gang-layout-refusal';
import type { GangLayout, GangLayoutSettings, PieceGroup } from '../../src/shared/cutting/gang-layout-types';
import { describeLength } from '../../src/shared/cutting/length-units';
import { checkMediaWidth } from '../../src/shared/cutting/media-limits';
import { chooseRoll, type RackRoll, type RollChoice } from '../../src/shared/cutting/roll-choice';
import { deductCut } from '../../src/shared/cutting/roll-deduction';
import { testCutDue, testCutLadder } from '../../src/shared/cutting/test-cut';
import type { Principal } from '../auth/principal';
import { requireCutFloor } from '../cutters/cut-floor';
import { hubEvent, reporterAt, type CutFloorEvents } from '../cutters/cut-events';
import { CuttersRepository } from '../cutters/cutters-repository';
import { toBladeState, toCutterMedia, toCutterView } from '../cutters/cutter-view';
import type { Db } from '../db/tables';
import type { DesignStore } from '../designs/design-store';
import { badRequest, conflict, notFound } from '../http/http-error';
import type { RollLowNotice } from '../rolls/roll-low-notice';
import { toRollView, type RollWithFilm } from '../rolls/roll-view';
import { cutterLayoutSvg } from './cutter-layout-svg';
import { BagNotWaitingError, CuttingRepository, type FilmWithType, type QueuedLayer } from './cutting-repository';
import { designsToCut, estimatePlan } from './plan-estimate';

/**
 * Dwell's starting spacing, in mm (common practice, no published source): 10 mm kept clear at each
 * roll edge for the pinch rollers, 6 mm of film between pieces, 3 mm weeding border around a design.
 */
export const DEFAULT_SPACING = { edgeMarginMm: 10, gapMm: 6, weedBorderMm: 3 } as const;

/** Film a three-rung test cut takes from the roll (common practice, no published source). */
export const TEST_CUT_FILM_MM = 50;

/** Builds a gang layout for a roll width, or the sentence why it cannot be made. */
type Attempt = { ok: true; layout: GangLayout; settings: GangLayoutSettings } | { ok: false; sentence: string };

/** Planning and confirming cuts: groups of queued bags by film, previews and confirmations. */
export class CutPlanService {
  private readonly cutting: CuttingRepository;
  private readonly cutters: CuttersRepository;

  constructor(
    db: Db,
    private readonly store: DesignStore,
    private readonly events: CutFloorEvents,
    private readonly lowNotice?: RollLowNotice,
  ) {
    this.cutting = new CuttingRepository(db);
    this.cutters = new CuttersRepository(db);
  }

  /** Queued bags grouped by each layer film they still need cut; a two-layer bag is in two groups. */
  async groups(): Promise<CutGroup[]> {
    const groups = new Map<number, CutGroup>();
    for (const layer of await this.cutting.queuedLayers()) {
      let group = groups.get(layer.film_id);
      if (!group) {
        group = { filmId: layer.film_id, filmTypeId: layer.film_type_id, filmTypeName: layer.film_type_name, colour: layer.colour, colourHex: layer.colour_hex, pieces: 0, bags: [] };
        groups.set(layer.film_id, group);
      }
      group.pieces += layer.pieces;
      group.bags.push(toGroupBag(layer));
    }
    return [...groups.values()].sort((a, b) => b.pieces - a.pieces || a.filmId - b.filmId);
  }

  /** The layout, roll, preset, estimate and test-cut advice for some bags on one film. */
  async preview(input: CutPlanRequest): Promise<CutPlanPreview> {
    const { film, cutter, layers } = await this.planInputs(input.bagIds, input.filmId, input.cutterId);
    const spacing = {
      edgeMarginMm: input.edgeMarginMm ?? DEFAULT_SPACING.edgeMarginMm,
      gapMm: input.gapMm ?? DEFAULT_SPACING.gapMm,
      weedBorderMm: input.weedBorderMm ?? DEFAULT_SPACING.weedBorderMm,
    };
    const units = await this.cutting.shopUnits();
    const groups = pieceGroups(layers);
    const media = toCutterMedia(cutter);
    const attempt = (rollWidthMm: number): Attempt => {
      const settings: GangLayoutSettings = {
        rollWidthMm,
        edgeMarginMm: spacing.edgeMarginMm,
        gapMm: spacing.gapMm,
        weedingBorderMm: spacing.weedBorderMm,
        rulerUnit: units === 'imperial' ? 'in' : 'mm',
      };
      try {
        return { ok: true, layout: layoutGang(groups, settings), settings };
      } catch (error) {
        if (error instanceof GangLayoutRefusal) return { ok: false, sentence: error.message };
        throw error;
      }
    };

    let roll: RollWithFilm | null = null;
    let planned: Extract<Attempt, { ok: true }>;
    let rollChoice: RollChoice;
    if (input.rollId !== undefined) {
      roll = (await this.cutting.roll(input.rollId)) ?? null;
      if (!roll) throw notFound(`There is no roll ${input.rollId}. Reload the Roll rack.`);
      if (roll.film_id !== film.id) throw badRequest(`Roll ${roll.label} holds ${roll.film_type_name} ${roll.colour}, not the film of these bags.`, [{ path: 'rollId', message: 'Another film.' }]);
      const fits = checkMediaWidth(media, roll.width_mm);
      if (!fits.fits) throw badRequest(fits.sentence, [{ path: 'rollId', message: fits.sentence }]);
      const tried = attempt(roll.width_mm);
      if (!tried.ok) throw badRequest(tried.sentence, [{ path: 'rollId', message: tried.sentence }]);
      planned = tried;
      rollChoice = chooseRoll(needOf(film.id, tried.layout), [toRackRoll(roll)], media);
    } else {
      const chosen = this.chooseAcrossWidths(film.id, await this.cutting.rollsOfFilm(film.id), media, attempt);
      planned = chosen.planned;
      rollChoice = chosen.rollChoice;
      roll = chosen.roll;
    }

    const wearClass = film.wear_class;
    const estimate = await estimatePlan(designsToCut(layers), { wearClass, cutSpeedMmS: film.cut_speed_mm_s }, this.store);
    const due = testCutDue(toBladeState(cutter, await this.cutters.lastFilmWearClass(cutter)), wearClass);
    const { triedStrategies: _tried, ...layout } = planned.layout;
    return {
      bags: layers.map(toGroupBag),
      film: { id: film.id, filmTypeName: film.name, colour: film.colour, colourHex: film.colour_hex },
      layout,
      cutterSvg: cutterLayoutSvg(layout.placements, planned.settings.rollWidthMm, layout.lengthUsedMm),
      settings: { ...spacing, rollWidthMm: planned.settings.rollWidthMm },
      rollChoice,
      roll: roll ? toRollView(roll) : null,
      preset: await this.preset(film, cutter.id),
      estimate,
      testCut: due,
      testCutFilmMm: TEST_CUT_FILM_MM,
      cutter: toCutterView(cutter),
      units,
    };
  }

  /** Confirms a cut: deducts the roll, wears the blade, writes the history and the bags' cut_done events, all at once. */
  async confirm(principal: Principal, input: CutConfirmRequest): Promise<CutConfirmReply> {
    const { film, cutter, layers } = await this.planInputs(input.bagIds, input.filmId, input.cutterId);
    const roll = await this.cutting.roll(input.rollId);
    if (!roll) throw notFound(`There is no roll ${input.rollId}. Reload the Roll rack.`);
    if (roll.film_id !== film.id) throw badRequest(`Roll ${roll.label} holds ${roll.film_type_name} ${roll.colour}, not the film of these bags.`, [{ path: 'rollId', message: 'Another film.' }]);
    const fits = checkMediaWidth(toCutterMedia(cutter), roll.width_mm);
    if (!fits.fits) throw badRequest(fits.sentence, [{ path: 'rollId', message: fits.sentence }]);
    requireCutFloor(principal);

    const estimate = await estimatePlan(designsToCut(layers), { wearClass: film.wear_class, cutSpeedMmS: film.cut_speed_mm_s }, this.store);
    const station = principal.role === 'operator' && principal.station ? principal.station : await this.cutters.cutStation(cutter.id);
    if (!station) throw conflict(`${cutter.name} has no cut station to record the cut against. Add one on the Stations screen.`);
    const testCutMm = input.testCutMm ?? 0;
    const pieces = new Map(layers.map((layer) => [layer.bag_id, layer.pieces]));
    let crossedReorder = false;
    const result = await this.cutting
      .confirmCut({
        rollId: roll.id,
        filmId: film.id,
        filmTypeId: film.film_type_id,
        cutterId: cutter.id,
        bagIds: input.bagIds,
        lengthMm: input.lengthMm,
        testCutMm,
        bladeDistanceMm: estimate.bladeDistanceMm,
        userId: principal.userId,
        deduct: (locked) => {
          const deduction = deductCut({ remainingMm: locked.remaining_mm, reorderMm: locked.reorder_mm }, input.lengthMm, testCutMm);
          if (deduction.overdrawnMm > 0) {
            throw conflict(
              `Roll ${locked.label} has only ${describeLength(locked.remaining_mm)} left, ${describeLength(deduction.overdrawnMm)} short of this cut: ` +
                'measure the roll, or plan the cut again on another roll.',
            );
          }
          crossedReorder = deduction.crossedReorder;
          return deduction;
        },
        recordEvents: async (trx, completeBagIds) => {
          const events = completeBagIds.map((bagId) =>
            hubEvent('cut_done', bagId, station.id, principal.userId!, pieces.get(bagId) ?? 0, { cutterId: cutter.id, rollId: roll.id, lengthMm: Math.round(input.lengthMm) }),
          );
          await this.events.record(trx, reporterAt(principal, station), events);
        },
        // Film running low is queued with the cut itself, so the message is never lost and never sent twice.
        afterRollChange: this.lowNotice ? (trx, rollId) => this.lowNotice!.afterCut(trx, rollId) : undefined,
      })
      .catch((error: unknown) => {
        if (error instanceof BagNotWaitingError) {
          const codes = layers.filter((l) => error.bagIds.includes(l.bag_id)).map((l) => l.bag_code);
          throw conflict(`Bag ${codes.join(', ') || error.bagIds.join(', ')} was cut on this film meanwhile: plan the cut again.`);
        }
        throw error;
      });

    this.events.announce(result.completeBagIds, await this.cutters.bagsVersion(result.completeBagIds));
    this.lowNotice?.kick();
    const after = (await this.cutting.roll(roll.id))!;
    const waitingBagIds = input.bagIds.filter((id) => !result.completeBagIds.includes(id));
    const waitingNote = waitingBagIds.length > 0 ? ` ${waitingBagIds.length} bag(s) still need another layer film cut.` : '';
    return {
      roll: toRollView(after),
      crossedReorder,
      cutter: toCutterView((await this.cutting.cutter(cutter.id))!),
      cutBagIds: result.completeBagIds,
      waitingBagIds,
      sentence: `Cut confirmed: ${describeLength(input.lengthMm + testCutMm)} taken from roll ${after.label}, ${describeLength(after.remaining_mm)} left.${crossedReorder ? ' The roll is now below its reorder length: order more.' : ''}${waitingNote}`,
    };
  }

  private async planInputs(bagIds: number[], filmId: number, cutterId: number): Promise<{ film: FilmWithType; cutter: NonNullable<Awaited<ReturnType<CuttingRepository['cutter']>>>; layers: QueuedLayer[] }> {
    const film = await this.cutting.film(filmId);
    if (!film) throw notFound(`There is no film ${filmId}. Reload the Gang planner.`);
    const cutter = await this.cutting.cutter(cutterId);
    if (!cutter) throw notFound(`There is no cutter ${cutterId}. Reload the screen.`);
    const layers = await this.cutting.queuedLayers({ bagIds, filmId });
    const missing = bagIds.filter((id) => !layers.some((layer) => layer.bag_id === id));
    if (missing.length > 0) {
      throw conflict(
        `${missing.length === 1 ? 'One bag is' : `${missing.length} bags are`} not waiting for ${film.name} ${film.colour} (bag id ${missing.join(', ')}): ` +
          'it may be cut already, use another film, or belong to a closed order. Reload the Gang planner.',
      );
    }
    return { film, cutter, layers };
  }

  private async preset(film: FilmWithType, cutterId: number): Promise<CutPreset> {
    return {
      filmTypeId: film.film_type_id,
      filmTypeName: film.name,
      wearClass: film.wear_class,
      forceG: film.cut_force_g,
      speedMmS: film.cut_speed_mm_s,
      bladeAngleDeg: film.blade_angle_deg,
      testedForceG: await this.cutters.testedForce(cutterId, film.film_type_id),
      ladderG: testCutLadder(film.cut_force_g),
    };
  }

  /**
   * Lays the bags out once per roll width on the rack and lets roll-choice pick among the rolls whose
   * own layout fits (partly used rolls first, then the narrowest). When none fits, the answer from the
   * widest roll explains the shortfall and any split.
   */
  private chooseAcrossWidths(
    filmId: number,
    rolls: RollWithFilm[],
    media: ReturnType<typeof toCutterMedia>,
    attempt: (width: number) => Attempt,
  ): { planned: Extract<Attempt, { ok: true }>; rollChoice: RollChoice; roll: RollWithFilm | null } {
    const takeable = rolls.filter((r) => checkMediaWidth(media, r.width_mm).fits);
    const widths = [...new Set(takeable.map((r) => r.width_mm))].sort((a, b) => a - b);
    const fitting: RollWithFilm[] = [];
    const byWidth = new Map<number, Extract<Attempt, { ok: true }>>();
    let refusal: string | null = null;
    for (const width of widths) {
      const tried = attempt(width);
      if (!tried.ok) {
        refusal = tried.sentence;
        continue;
      }
      byWidth.set(width, tried);
      const need = needOf(filmId, tried.layout);
      fitting.push(...takeable.filter((r) => r.width_mm === width && chooseRoll(need, [toRackRoll(r)], media).kind === 'roll'));
    }
    if (fitting.length > 0) {
      // Every roll here fits its own layout, so a zero need lets roll-choice apply only its preference order.
      const pick = chooseRoll({ filmId, widthNeededMm: 0, lengthUsedMm: 0 }, fitting.map(toRackRoll), media);
      const roll = fitting.find((r) => pick.kind === 'roll' && r.id === pick.roll.id)!;
      const planned = byWidth.get(roll.width_mm)!;
      return { planned, rollChoice: chooseRoll(needOf(filmId, planned.layout), [toRackRoll(roll)], media), roll };
    }
    const widest = widths.length > 0 ? byWidth.get(widths[widths.length - 1]!) : undefined;
    if (!widest) {
      if (refusal) throw badRequest(refusal);
      // No roll of this film on the rack (or none the cutter takes): lay out on the cutter's widest media.
      const fallback = attempt(Math.min(media.maxMediaMm, media.carriageWidthMm));
      if (!fallback.ok) throw badRequest(fallback.sentence);
      return { planned: fallback, rollChoice: chooseRoll(needOf(filmId, fallback.layout), rolls.map(toRackRoll), media), roll: null };
    }
    return { planned: widest, rollChoice: chooseRoll(needOf(filmId, widest.layout), rolls.map(toRackRoll), media), roll: null };
  }
}

function toGroupBag(layer: QueuedLayer): CutGroupBag {
  const layerCount = Number(layer.layer_count);
  return {
    bagId: layer.bag_id,
    bagCode: layer.bag_code,
    orderCode: layer.order_code,
    jobName: layer.job_name,
    pieces: layer.pieces,
    designWidthMm: layer.design_width_mm,
    designHeightMm: layer.design_height_mm,
    rotationAllowed: Boolean(layer.rotation_allowed),
    layerNote: layerCount > 1 ? `Layer ${layer.position} of ${layerCount}` : null,
  };
}

/** One group per bag: its pieces are the job's design box (roster names are not sized separately). */
function pieceGroups(layers: readonly QueuedLayer[]): PieceGroup[] {
  return layers.map((layer) => ({
    id: `bag-${layer.bag_id}`,
    label: layer.bag_code,
    designWidthMm: layer.design_width_mm,
    designHeightMm: layer.design_height_mm,
    quantity: layer.pieces,
    mayRotate: Boolean(layer.rotation_allowed),
  }));
}

function needOf(filmId: number, layout: GangLayout) {
  return { filmId, widthNeededMm: layout.widthNeededMm, lengthUsedMm: layout.lengthUsedMm };
}

function toRackRoll(roll: RollWithFilm): RackRoll {
  return { id: roll.id, label: roll.label, filmId: roll.film_id, widthMm: roll.width_mm, lengthMm: roll.length_mm, remainingMm: roll.remaining_mm, reorderMm: roll.reorder_mm, rackSlot: roll.rack_slot };
}
