import { ehlAtPoint } from '../../app/review/ehlAtPoint';
import type { FilmMessage, FilmRequest } from './filmProtocol';

/** One solve, answered as a message; a refusal (unknown point, a review the physics cannot take) is a 'failed' message in words. */
export function computeFilm(req: FilmRequest): FilmMessage {
  try {
    const result = ehlAtPoint(req.review, req.point, req.nodes !== undefined ? { nodes: req.nodes } : {}, () => performance.now());
    return { run: req.run, kind: 'done', result };
  } catch (e) {
    return { run: req.run, kind: 'failed', message: (e as Error).message };
  }
}
