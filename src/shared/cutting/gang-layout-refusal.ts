/** Why a gang layout cannot be made; the message is a sentence for the planner. */
export class GangLayoutRefusal extends Error {
  constructor(
    readonly reason: 'piece-too-wide' | 'no-usable-width' | 'bad-input',
    message: string,
  ) {
    super(message);
    this.name = 'GangLayoutRefusal';
  }
}
