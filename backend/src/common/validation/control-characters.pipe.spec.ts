import { BadRequestException } from '@nestjs/common';
import { ControlCharactersPipe, controlCharacterMessages } from './control-characters.pipe';

describe('control characters in text', () => {
  it('names each field that holds one, with the storey where there is one', () => {
    expect(
      controlCharacterMessages({
        title: 'Frame\u0000A',
        storeys: [{ label: 'ok' }, { label: 'Roof\u001b' }],
        nested: { note: 'bell\u0007' },
      }),
    ).toEqual([
      'title must not contain control characters (found U+0000)',
      'storeys[1].label (storey 2) must not contain control characters (found U+001B)',
      'nested.note must not contain control characters (found U+0007)',
    ]);
  });

  it('keeps tabs, line feeds and carriage returns, and other text as it is', () => {
    expect(
      controlCharacterMessages({ comment: 'line one\r\nline\ttwo', name: 'Straße 4' }),
    ).toEqual([]);
  });

  it('names a field name that holds one', () => {
    expect(controlCharacterMessages({ inputs: { 'a\u0001': 1 } })).toEqual([
      'inputs has a field name with a control character',
    ]);
  });

  it('refuses bodies and queries with a 400, and leaves route parameters to their own pipes', () => {
    const pipe = new ControlCharactersPipe();
    expect(() => pipe.transform({ name: 'x\u007f' }, { type: 'body' })).toThrow(
      BadRequestException,
    );
    expect(() => pipe.transform({ q: 'x\u0000' }, { type: 'query' })).toThrow(BadRequestException);
    expect(pipe.transform('x\u0000', { type: 'param' })).toBe('x\u0000');
  });
});
