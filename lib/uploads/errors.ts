/** The bytes start like an image of this format but are not a well-formed one. */
export class InvalidImageError extends Error {
  constructor(readonly format: string) {
    super(`The file is not a valid ${format} image (it is damaged or only looks like one).`);
    this.name = 'InvalidImageError';
  }
}
