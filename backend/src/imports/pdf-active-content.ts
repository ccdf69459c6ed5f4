import {
  PDFArray,
  PDFDict,
  PDFDocument,
  PDFName,
  PDFStream,
  type PDFObject,
} from '@cantoo/pdf-lib';

/**
 * Names that mark active or outward-reaching content in a PDF (ISO 32000-1: JavaScript 12.6.4.16
 * and 7.11.4 name tree; launch, remote go-to, URI, submit-form and import-data actions 12.6.4;
 * embedded files 7.11.4; rich media, and XFA forms 12.7.8), with what to call them.
 */
const ACTIVE_NAMES = new Map([
  ['JavaScript', 'JavaScript'],
  ['JS', 'JavaScript'],
  ['Launch', 'a launch action'],
  ['GoToR', 'a link to another file'],
  ['GoToE', 'a link into an embedded file'],
  ['URI', 'a web link'],
  ['SubmitForm', 'a form that sends data'],
  ['ImportData', 'a form that imports data'],
  ['EmbeddedFile', 'an embedded file'],
  ['EmbeddedFiles', 'an embedded file'],
  ['RichMedia', 'rich media'],
  ['XFA', 'an XFA form'],
]);

/** Nesting deeper than this in one object is refused rather than walked. */
const MAX_DEPTH = 64;

/**
 * Why a PDF is refused as an attachment, or null when it holds nothing active. The file is
 * parsed with a maintained PDF library (@cantoo/pdf-lib, which also unpacks compressed object
 * streams and decodes `#xx` escapes in names, ISO 32000-1 7.3.5), and every object is walked:
 * the keys and name values of every dictionary, array and stream dictionary. A PDF that cannot
 * be parsed, or whose objects cannot be read (encrypted with a password), is refused, since what
 * cannot be checked is not kept with a calc of record.
 */
export async function pdfActiveContent(bytes: Uint8Array): Promise<string | null> {
  let document: PDFDocument;
  try {
    document = await PDFDocument.load(bytes, {
      throwOnInvalidObject: true,
      updateMetadata: false,
      // Kept, so that an XFA form is seen here rather than silently dropped by the library.
      preserveXFA: true,
    });
    // The parser is lenient: a file with no document catalog or no page is no document.
    if (!document.context.trailerInfo.Root || document.getPageCount() < 1) {
      throw new Error('no pages');
    }
  } catch (error) {
    return error instanceof Error && /encrypt|password/i.test(error.message)
      ? 'is an encrypted PDF, so its content cannot be checked; attach an unprotected copy'
      : 'cannot be read as a PDF, so its content cannot be checked';
  }
  for (const [, object] of document.context.enumerateIndirectObjects()) {
    const found = activeName(object, 0);
    if (found === 'too deep') return 'nests its objects too deeply to be checked';
    if (found) {
      return `contains ${ACTIVE_NAMES.get(found)} (/${found}), which is not kept with a calc; print it to a plain PDF first`;
    }
  }
  return null;
}

/** The first active name in the object (or 'too deep'), or null. */
function activeName(object: PDFObject, depth: number): string | null {
  if (depth > MAX_DEPTH) return 'too deep';
  if (object instanceof PDFName) {
    const name = object.decodeText();
    return ACTIVE_NAMES.has(name) ? name : null;
  }
  if (object instanceof PDFStream) return activeName(object.dict, depth + 1);
  if (object instanceof PDFDict) {
    for (const [key, value] of object.entries()) {
      const found = activeName(key, depth + 1) ?? activeName(value, depth + 1);
      if (found) return found;
    }
    return null;
  }
  if (object instanceof PDFArray) {
    for (const item of object.asArray()) {
      const found = activeName(item, depth + 1);
      if (found) return found;
    }
  }
  return null;
}
