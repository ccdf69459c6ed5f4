/** Thrown while JSON is parsed, for a key that could reach an object's prototype. */
export class RefusedFieldError extends SyntaxError {
  constructor(key: string) {
    super(`The request has a field named "${key}", which is not allowed`);
    this.name = 'RefusedFieldError';
  }
}
