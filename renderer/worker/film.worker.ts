import { computeFilm } from './filmCompute';
import type { FilmMessage, FilmRequest } from './filmProtocol';

// The renderer's tsconfig has the DOM lib, not the webworker one; this is the part of the worker scope used here.
const scope = self as unknown as { onmessage: ((e: MessageEvent<FilmRequest>) => void) | null; postMessage(message: FilmMessage): void };

scope.onmessage = (e) => scope.postMessage(computeFilm(e.data));
