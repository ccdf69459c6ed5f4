import type { ValidationError } from 'class-validator';

/** Paths whose array items are told by their number on screen as well as by their index. */
const ITEM_NAMES: [RegExp, string][] = [
  [/(?:^|\.)storeys\[(\d+)\]/, 'storey'],
  [/(?:^|\.)spectrum\.points\[(\d+)\]/, 'point'],
];

/**
 * Turns class-validator's tree of errors into messages that name the full path of the field:
 * `storeys[3].mass (storey 4) must be a positive number`. Messages begin with the property
 * name (class-validator's own do, and Tiermode's are written so); that name is replaced by the
 * path.
 */
export function formatValidationErrors(errors: ValidationError[], parent = ''): string[] {
  return errors.flatMap((error) => {
    const path = !parent
      ? error.property
      : /^\d+$/.test(error.property)
        ? `${parent}[${error.property}]`
        : `${parent}.${error.property}`;
    const own = Object.values(error.constraints ?? {}).map((message) =>
      rewrite(message, error.property, path),
    );
    return [...own, ...formatValidationErrors(error.children ?? [], path)];
  });
}

function rewrite(message: string, property: string, path: string): string {
  const label = labelOf(path);
  if (message.startsWith(`property ${property} `)) {
    return `property ${label}${message.slice(`property ${property}`.length)}`;
  }
  if (message.startsWith(`${property} `)) return `${label}${message.slice(property.length)}`;
  return `${label}: ${message}`;
}

/** A field path as people read it: `storeys[3].mass (storey 4)`. */
export function labelOf(path: string): string {
  for (const [pattern, noun] of ITEM_NAMES) {
    const match = pattern.exec(path);
    if (match) return `${path} (${noun} ${Number(match[1]) + 1})`;
  }
  return path;
}
