import { equivalentGaugePsi, geometryProblems, overMaximumProblem, readingAtGauge, type AirPressGeometry } from '../../src/shared/press/air-press';
import { resolvePressCard, type CardFilm, type PressCardStop } from '../../src/shared/press/press-card';
import type { GaugeReply, GaugeRequest, PressCard } from '../../src/shared/press/press-contract';
import { psiToKpa, roundTo } from '../../src/shared/press/units';
import { badRequest, HttpError, notFound } from '../http/http-error';
import type { PressRepository } from './press-repository';

/** A stop becomes an answer: a missing recipe or no layers is 422 (the request is sound, the Recipe book or job is not ready); an unusable press is 400. */
function stopError(stop: PressCardStop): HttpError {
  if (stop.kind === 'press_not_usable') return badRequest(stop.message);
  const details = stop.missing?.map((m) => ({ path: 'layers', message: `No recipe for ${m.filmTypeName} on ${m.fabricName}.` }));
  return new HttpError(422, stop.message, details);
}

/** Resolves press cards from stored bags, films and recipes, and answers gauge questions. */
export class PressCardService {
  constructor(private readonly repository: PressRepository) {}

  /** The press card for a bag on a press. */
  async forBag(bagId: number, pressId: number): Promise<PressCard> {
    const bag = await this.repository.bagPressing(bagId);
    if (!bag) throw notFound(`There is no bag ${bagId}. Scan the bag's label again.`);
    return this.resolve(bag.layers, bag.fabricId, pressId);
  }

  /** The press card for films (bottom first) on a fabric on a press, before any bag exists. */
  async preview(filmIds: number[], fabricId: number, pressId: number): Promise<PressCard> {
    const found = await this.repository.findFilms(filmIds);
    const byId = new Map(found.map((film) => [film.filmId, film]));
    const unknown = [...new Set(filmIds.filter((id) => !byId.has(id)))];
    if (unknown.length > 0) throw notFound(`There is no film ${unknown.join(', ')}. Pick the films from the film list.`);
    return this.resolve(filmIds.map((id) => byId.get(id)!), fabricId, pressId);
  }

  private async resolve(layers: CardFilm[], fabricId: number, pressId: number): Promise<PressCard> {
    const [press, fabric] = await Promise.all([this.repository.findPress(pressId), this.repository.findFabric(fabricId)]);
    if (!press) throw notFound(`There is no press ${pressId}. Pick the press from the list of presses.`);
    if (!fabric) throw notFound(`There is no fabric ${fabricId}. Pick the fabric from the list of fabrics.`);
    const [filmTypes, recipes, shop] = await Promise.all([
      this.repository.filmTypes(),
      this.repository.recipesForFabric(fabricId),
      this.repository.shopPressSettings(),
    ]);
    const result = resolvePressCard({ layers, fabric, filmTypes, recipes, press, ...shop });
    if (!result.ok) throw stopError(result.stop);
    return result.card;
  }
}

/** Platen pressure and force for a gauge setting, and the equivalent gauge on another platen or press. */
export function gaugeAnswer(request: GaugeRequest): GaugeReply {
  const source: AirPressGeometry = { ...request, maxGaugePsi: request.maxGaugePsi ?? null };
  const target: AirPressGeometry | null = request.target
    ? { ...request.target, boreIn: request.target.boreIn ?? request.boreIn, maxGaugePsi: request.target.maxGaugePsi ?? null }
    : null;
  const problems = [...geometryProblems(source, 'the press'), ...(target ? geometryProblems(target, 'the target platen') : [])];
  const overMax = overMaximumProblem(request.gaugePsi, source, 'the press');
  if (overMax) problems.push(overMax);
  if (problems.length > 0) throw badRequest(problems.join(' '));

  const reading = readingAtGauge(request.gaugePsi, source);
  // Rounded only here, for people: platen pressures are small numbers, so they keep three decimals.
  const reply: GaugeReply = {
    platenPsi: roundTo(reading.platenPsi, 3),
    platenKPa: roundTo(psiToKpa(reading.platenPsi), 2),
    forceLbf: roundTo(reading.forceLbf, 1),
    forceN: roundTo(reading.forceN, 1),
  };
  if (target) {
    const targetGauge = equivalentGaugePsi(request.gaugePsi, source, target);
    const targetOverMax = overMaximumProblem(targetGauge, target, 'the target press');
    if (targetOverMax) throw badRequest(targetOverMax);
    reply.targetGaugePsi = roundTo(targetGauge, 1);
    reply.targetGaugeKPa = roundTo(psiToKpa(targetGauge), 1);
  }
  return reply;
}
