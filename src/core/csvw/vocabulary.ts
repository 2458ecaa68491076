// Names the CSV on the Web standard defines: its built-in datatypes ("Metadata Vocabulary for
// Tabular Data" §5.11.1), the terms of its JSON-LD context (http://www.w3.org/ns/csvw),
// and the syntax of language tags (BCP 47). Kept apart so that parser and checker agree.

/** How Assay reads a built-in datatype: its family decides parsing, checking and our column type. */
export type DatatypeFamily = 'integer' | 'decimal' | 'double' | 'boolean' | 'date' | 'datetime' | 'time' | 'string' | 'unchecked';

interface BuiltIn {
  family: DatatypeFamily;
  /** Implied inclusive bounds of the integer subtypes (XML Schema 1.1 Part 2 §3.4); the 64-bit ones as doubles. */
  min?: number;
  max?: number;
  /** XML Schema's dateTimeStamp requires a time zone. */
  zone?: boolean;
}

const I = (min?: number, max?: number): BuiltIn => ({ family: 'integer', ...(min !== undefined ? { min } : {}), ...(max !== undefined ? { max } : {}) });

/** Every built-in datatype name, and the aliases `number`, `binary`, `datetime`, `any`. */
export const BUILT_IN_DATATYPES: ReadonlyMap<string, BuiltIn> = new Map<string, BuiltIn>([
  ['integer', I()], ['long', I(-(2 ** 63), 2 ** 63)], ['int', I(-2147483648, 2147483647)],
  ['short', I(-32768, 32767)], ['byte', I(-128, 127)], ['nonNegativeInteger', I(0)], ['positiveInteger', I(1)],
  ['unsignedLong', I(0, 2 ** 64)], ['unsignedInt', I(0, 4294967295)], ['unsignedShort', I(0, 65535)],
  ['unsignedByte', I(0, 255)], ['nonPositiveInteger', I(undefined, 0)], ['negativeInteger', I(undefined, -1)],
  ['decimal', { family: 'decimal' }],
  ['double', { family: 'double' }], ['number', { family: 'double' }], ['float', { family: 'double' }],
  ['boolean', { family: 'boolean' }],
  ['date', { family: 'date' }],
  ['dateTime', { family: 'datetime' }], ['datetime', { family: 'datetime' }], ['dateTimeStamp', { family: 'datetime', zone: true }],
  ['time', { family: 'time' }],
  ['string', { family: 'string' }], ['normalizedString', { family: 'string' }], ['token', { family: 'string' }],
  ['language', { family: 'string' }], ['Name', { family: 'string' }], ['NMTOKEN', { family: 'string' }],
  ['xml', { family: 'string' }], ['html', { family: 'string' }], ['json', { family: 'string' }],
  ['anyAtomicType', { family: 'string' }], ['any', { family: 'string' }], ['anyURI', { family: 'string' }],
  ['QName', { family: 'string' }],
  ['base64Binary', { family: 'unchecked' }], ['binary', { family: 'unchecked' }], ['hexBinary', { family: 'unchecked' }],
  ['duration', { family: 'unchecked' }], ['dayTimeDuration', { family: 'unchecked' }], ['yearMonthDuration', { family: 'unchecked' }],
  ['gDay', { family: 'unchecked' }], ['gMonth', { family: 'unchecked' }], ['gMonthDay', { family: 'unchecked' }],
  ['gYear', { family: 'unchecked' }], ['gYearMonth', { family: 'unchecked' }],
]);

/** Bases whose values are strings for the length constraints (string, its subtypes, binary types; §5.11.2). */
export const LENGTH_BASES: ReadonlySet<string> = new Set([
  'string', 'normalizedString', 'token', 'language', 'Name', 'NMTOKEN', 'xml', 'html', 'json',
  'base64Binary', 'binary', 'hexBinary',
]);

/** Bases whose cells are taken as written, without whitespace normalisation ("Model for Tabular Data" §6.4). */
export const VERBATIM_BASES: ReadonlySet<string> = new Set(['string', 'json', 'xml', 'html', 'anyAtomicType', 'any']);

/** Terms of the context usable as an `@type`: the vocabulary's classes and the datatype names. */
export const CONTEXT_TYPE_TERMS: ReadonlySet<string> = new Set([
  'Cell', 'Column', 'Datatype', 'Dialect', 'Direction', 'ForeignKey', 'NumericFormat', 'Row', 'Schema', 'Table',
  'TableGroup', 'TableReference', 'Template', 'Transformation', ...BUILT_IN_DATATYPES.keys(),
]);

/**
 * An absolute IRI: a scheme, a colon, no white space (RFC 3987, loosely). Prefixed names such as
 * `schema:Thing` fit too, whether or not the prefix is one of the context's: JSON-LD reads an
 * unknown prefix as a scheme.
 */
export function isAbsoluteIri(s: string): boolean {
  return /^[A-Za-z][A-Za-z0-9+.-]*:\S*$/.test(s) && !s.startsWith('_:');
}

/**
 * A well-formed BCP 47 language tag (RFC 5646 syntax, not registry membership): a 2-8 letter primary
 * subtag, or `x-`/`i-` forms, then subtags of 1-8 letters or digits. Example: "en-GB" yes, "a-bad-language" no.
 */
export function isLanguageTag(s: string): boolean {
  return /^(?:[A-Za-z]{2,8}|[xXiI](?=-))(?:-[A-Za-z0-9]{1,8})*$/.test(s);
}

export const CSVW_CONTEXT = 'http://www.w3.org/ns/csvw';
