// The one error the engine throws on purpose. Every file checks its own input, so the class lives
// apart from all of them and the HTTP layer has a single thing to recognise.

/** Bad input the caller should have caught; the HTTP layer answers it with a 400 and `path`. */
export class CareInputError extends Error {
  readonly path: string;

  constructor(message: string, path: string) {
    super(message);
    this.name = 'CareInputError';
    this.path = path;
  }
}
