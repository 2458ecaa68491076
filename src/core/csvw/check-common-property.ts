// Values of common properties (annotations such as `dc:title`, `rdfs:comment`) must be a restricted
// form of JSON-LD ("Metadata Vocabulary for Tabular Data" §5.8 Common Properties). Assay does not
// use them, but a validator must reject the forms the standard forbids.
import { itemPath, memberPath, type JsonValue } from './parse-json';
import { CONTEXT_TYPE_TERMS, isAbsoluteIri, isLanguageTag } from './vocabulary';

/** Receives the JSON path of the offending value and what is wrong with it (without the path). */
export type Report = (path: string, message: string) => void;

const isTypeName = (s: string): boolean => CONTEXT_TYPE_TERMS.has(s) || isAbsoluteIri(s);

function checkType(v: JsonValue, path: string, report: Report): void {
  const names = Array.isArray(v) ? v : [v];
  names.forEach((n, i) => {
    const at = Array.isArray(v) ? itemPath(path, i) : path;
    if (typeof n !== 'string') report(at, `expected a string, got ${JSON.stringify(n)}`);
    else if (n.startsWith('_:')) report(at, `must not be a blank node, got "${n}"`);
    else if (!isTypeName(n)) report(at, `expected a term of the CSV on the Web context, a prefixed name or an absolute URL, got "${n}"`);
  });
}

/**
 * Reports every way a common property's value breaks §5.8: list and set objects, nested contexts,
 * blank-node identifiers, unknown keywords, malformed value objects and language tags.
 * Example: checkCommonProperty({ '@list': [1] }, '$["rdf:value"]', report) reports "@list".
 */
export function checkCommonProperty(value: JsonValue, path: string, report: Report, depth = 0): void {
  if (depth > 50) return;
  if (Array.isArray(value)) {
    value.forEach((v, i) => checkCommonProperty(v, itemPath(path, i), report, depth + 1));
    return;
  }
  if (value === null || typeof value !== 'object') return;
  const keys = Object.keys(value);
  if ('@value' in value) {
    const v = value['@value'];
    if (v === null || typeof v === 'object') report(memberPath(path, '@value'), `expected a string, number or boolean, got ${JSON.stringify(v)}`);
    const others = keys.filter((k) => k !== '@value');
    const bad = others.filter((k) => k !== '@type' && k !== '@language');
    if (bad.length > 0) report(path, `a value object may only have @type or @language beside @value, got ${bad.map((k) => `"${k}"`).join(', ')}`);
    if (others.includes('@type') && others.includes('@language')) report(path, 'a value object must not have both @type and @language');
    if ('@language' in value) {
      const lang = value['@language'];
      if (lang !== null && (typeof lang !== 'string' || !isLanguageTag(lang))) {
        report(memberPath(path, '@language'), `expected a BCP 47 language tag, got ${JSON.stringify(lang)}`);
      }
    }
    if ('@type' in value) checkType(value['@type'] as JsonValue, memberPath(path, '@type'), report);
    return;
  }
  for (const key of keys) {
    const v = value[key] as JsonValue;
    const at = memberPath(path, key);
    if (key === '@id') {
      if (typeof v !== 'string') report(at, `expected a string, got ${JSON.stringify(v)}`);
      else if (v.startsWith('_:')) report(at, `must not be a blank node, got "${v}"`);
    } else if (key === '@type') checkType(v, at, report);
    else if (key === '@language') report(at, 'only allowed together with @value');
    else if (key === '@context') report(at, 'a metadata document must not add a context inside a property value');
    else if (key === '@list' || key === '@set') report(at, 'list and set objects are not allowed in metadata');
    else if (key.startsWith('@')) report(at, 'not a keyword allowed here (only @id, @type, @value and @language are)');
    else checkCommonProperty(v, at, report, depth + 1);
  }
}
