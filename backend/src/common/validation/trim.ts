/** For class-transformer's @Transform: trims strings and leaves anything else for the validators. */
export const trim = ({ value }: { value: unknown }): unknown =>
  typeof value === 'string' ? value.trim() : value;
