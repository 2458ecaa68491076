// jstat 1.9.6 (dev-dependency) as an independent Student t quantile. It ships no types, so it is loaded
// through createRequire with the one signature used; its accuracy is about 1e-8.
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
export const jStat = (require('jstat') as { jStat: { studentt: { inv(p: number, df: number): number } } }).jStat;
