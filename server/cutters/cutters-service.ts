import type { CutterView, TestCutReply, TestCutRequest } from '../../src/shared/cutting/cut-plan-contract';
import { recordTestCut } from '../../src/shared/cutting/test-cut';
import type { Principal } from '../auth/principal';
import type { Db } from '../db/tables';
import { badRequest, conflict, notFound } from '../http/http-error';
import { requireCutFloor } from './cut-floor';
import { hubEvent, reporterAt, type CutFloorEvents } from './cut-events';
import { toCutterView } from './cutter-view';
import { CuttersRepository } from './cutters-repository';

/** Cutters, blade changes and test cuts. */
export class CuttersService {
  private readonly cutters: CuttersRepository;

  constructor(
    private readonly db: Db,
    private readonly events: CutFloorEvents,
  ) {
    this.cutters = new CuttersRepository(db);
  }

  /** Every cutter with its blade state. */
  async list(): Promise<CutterView[]> {
    return (await this.cutters.list()).map(toCutterView);
  }

  /**
   * Records a test cut. When a force cut and weeded clean, the test is on record (no longer due)
   * and that force is remembered for this cutter and film type; the film type's preset is left as
   * the shop set it. A test where nothing came clean is answered with what to try next and changes nothing.
   */
  async recordTestCut(principal: Principal, input: TestCutRequest): Promise<TestCutReply> {
    const cutter = await this.cutters.find(input.cutterId);
    if (!cutter) throw notFound(`There is no cutter ${input.cutterId}. Reload the screen.`);
    const filmType = await this.cutters.filmType(input.filmTypeId);
    if (!filmType) throw badRequest('Choose a film type from the list: that one does not exist.', [{ path: 'filmTypeId', message: 'No such film type.' }]);
    requireCutFloor(principal);
    if (input.bagId !== undefined && !(await this.cutters.bagExists(input.bagId))) throw notFound(`There is no bag ${input.bagId}. Scan the bag again.`);
    const record = recordTestCut(input.steps);
    if (record.passed) await this.cutters.recordPassedTest(cutter.id, filmType.id, record.nextForceG, new Date());
    if (input.bagId !== undefined) {
      const station = principal.role === 'operator' && principal.station ? principal.station : await this.cutters.cutStation(cutter.id);
      if (!station) throw conflict(`${cutter.name} has no cut station to record the test cut against. Add one on the Stations screen.`);
      await this.events.record(this.db, reporterAt(principal, station), [
        hubEvent('test_cut', input.bagId, station.id, principal.userId!, 0, {
          cutterId: cutter.id,
          filmTypeId: filmType.id,
          steps: record.rungs,
          chosenForceG: record.passed ? record.nextForceG : null,
        }),
      ]);
      this.events.announce([input.bagId], await this.cutters.bagsVersion([input.bagId]));
    }
    return { passed: record.passed, nextForceG: record.nextForceG, sentence: record.sentence, cutter: toCutterView((await this.cutters.find(cutter.id))!) };
  }

  /** A new blade is in: distance back to zero and a test cut due. */
  async bladeChanged(principal: Principal, cutterId: number): Promise<CutterView> {
    const cutter = await this.cutters.find(cutterId);
    if (!cutter) throw notFound(`There is no cutter ${cutterId}. Reload the screen.`);
    requireCutFloor(principal);
    await this.cutters.bladeChanged(cutterId, new Date());
    return toCutterView((await this.cutters.find(cutterId))!);
  }
}
