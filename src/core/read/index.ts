// The reading stage: bytes -> encoding -> UTF-8 -> dialect -> records and fields, plus exact cell
// positions and record boundaries for splitting work.
export { detectEncoding, firstInvalidUtf8, type EncodingGuess } from './detect-encoding';
export { createUtf8Transcoder, type Utf8Transcoder } from './utf8-transcoder';
export { sniffDialect, type Dialect, type DialectOverrides } from './sniff-dialect';
export { byteDialect, checkByteDialect, type ByteDialect } from './byte-dialect';
export { RecordScanner, type RecordScannerOptions } from './record-scanner';
export { FIELD_QUOTED, FIELD_ESCAPED, FIELD_LOOSE, FIELD_UNTERMINATED, type RecordView } from './record-view';
export { recordBounds, type RecordBounds } from './record-bounds';
export { spanOfField, spanOfRecord, fieldAtOffset } from './cell-span';
export { findRecordStart, findRecordStartAfter, type FindRecordStartOptions } from './find-record-start';
export { splitSample, type SampleRecords } from './split-sample';
export { guessHeader, type HeaderGuess } from './guess-header';
export { guessDecimalSeparator, type DecimalGuess } from './guess-decimal-separator';
