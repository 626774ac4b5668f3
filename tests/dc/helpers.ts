import { DEFAULT_TECHNOLOGY, type Technology } from '../../src/core/model/technology.ts';

/** Square-law devices only: no body effect, no channel-length modulation (the books' hand analysis). */
export function squareLaw(tech: Partial<Technology>): Technology {
  return { ...DEFAULT_TECHNOLOGY, gamman: 0, gammap: 0, lambdan: 0, lambdap: 0, ...tech };
}
