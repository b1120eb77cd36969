/** A column or grid that breaks the library's physical or structural assumptions; the message names what is wrong. */
export class InvalidProfileError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "InvalidProfileError";
  }
}

/** Grid arrays whose lengths do not match the declared shape. */
export class GridShapeError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "GridShapeError";
  }
}
