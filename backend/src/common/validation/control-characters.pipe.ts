import {
  BadRequestException,
  Injectable,
  type ArgumentMetadata,
  type PipeTransform,
} from '@nestjs/common';
import { labelOf } from './format-validation-errors';

/**
 * C0 control characters other than tab, line feed and carriage return, and DEL. A NUL once broke
 * the SQL text of a save (a 500); none of them belongs in a title, a label or a comment.
 */
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

/** Where in a parsed body or query a text holds a control character, as messages naming the field. */
export function controlCharacterMessages(value: unknown, path = ''): string[] {
  if (typeof value === 'string') {
    const found = CONTROL.exec(value);
    if (!found) return [];
    const code = found[0].charCodeAt(0).toString(16).toUpperCase().padStart(4, '0');
    return [`${labelOf(path || 'value')} must not contain control characters (found U+${code})`];
  }
  if (Array.isArray(value)) {
    return value.flatMap((item, index) => controlCharacterMessages(item, `${path}[${index}]`));
  }
  if (value !== null && typeof value === 'object') {
    return Object.entries(value).flatMap(([key, item]) => {
      const at = path ? `${path}.${key}` : key;
      const badKey = CONTROL.test(key)
        ? [`${labelOf(path || 'body')} has a field name with a control character`]
        : [];
      return [...badKey, ...controlCharacterMessages(item, at)];
    });
  }
  return [];
}

/** Runs before validation on every body and query: control characters are refused by field. */
@Injectable()
export class ControlCharactersPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type !== 'body' && metadata.type !== 'query') return value;
    const messages = controlCharacterMessages(value, metadata.data ?? '');
    if (messages.length > 0) throw new BadRequestException(messages);
    return value;
  }
}
