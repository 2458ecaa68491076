// Command-line words -> a plain record; every mistake is a one-line message naming the option.
export interface CliArgs {
  file?: string;
  format: 'json' | 'markdown' | 'text';
  bins?: string;
  edges?: string;
  delimiter?: string;
  quote?: string;
  encoding?: string;
  header?: boolean;
  decimal?: '.' | ',';
  groupBy: string[];
  metadata?: string;
  noMetadata: boolean;
  /** Look every cell up by its text as it is read (ProfileOptions.countByValue false). */
  countByText?: boolean;
  rules?: string;
  failOn: string[];
  quantileType?: number;
  top?: number;
  missing?: string[];
  maxFlags?: number;
  /** Rule thresholds given on the command line (names as in RuleOptions). */
  thresholds: Record<string, number>;
  levels: Record<string, string>;
  types: Record<string, string>;
  maxRecords?: number;
  /** MB one job may hold (0: no ceiling); undefined: the default. */
  memoryLimit?: number;
  exactLimit?: number;
  significantDigits?: number;
  /** Worker threads; undefined: 1 below 64 MB, else min(2, cores). */
  workers?: number;
  quiet: boolean;
  help: boolean;
  version: boolean;
}

export const USAGE = `Usage: assay FILE [options]

Profiles a delimited data file (CSV, TSV, semicolon or pipe separated) and prints what it holds.

Output
  --format text|markdown|json   text (default): facts, columns and flags with file:line:column;
                                markdown: the full report; json: the profile (docs/profile.md)
  --significant-digits N        digits shown for numbers (default 4)
Reading
  --delimiter C                 field delimiter (, ; tab |); sniffed when absent
  --quote C                     quote character; sniffed when absent
  --header | --no-header        whether the first record names the columns
  --decimal-comma               numbers use a decimal comma (1,5)
  --encoding E                  utf-8, utf-16le, utf-16be or windows-1252; detected when absent
  --missing LIST                comma-separated missing-value tokens (empty cells always count)
  --max-records N               read only the first N records (a partial profile)
  --memory-limit MB             memory one profile may use (default 8192; 0: no ceiling); past it,
                                reading stops with an error and a profile of the records before
  --exact-limit N               numbers or dates a column keeps exactly (default 50000000); past it,
                                a rank sketch: quantiles and histogram within a stated rank error
Summaries
  --bins RULE|N|width=W         sqrt, sturges, rice, doane, scott, fd (default), auto, a count or a width
  --edges nice|exact            nice (default): rounded widths, every interval [a, b);
                                exact: equal widths from min to max, last interval closed
  --quantile-type N             Hyndman & Fan definition 1-9 (default 7)
  --top N                       rows of each frequency table (default 50)
  --group-by COLUMN             compare every numeric column across the groups of COLUMN (repeatable)
Flags and constraints
  --rules LIST                  comma-separated rule ids to run, or all
  --max-flags N                 findings kept per rule and column (default 1000; totals still counted)
  --tukey-k K, --tukey-far-k K  Tukey fence multipliers (default 1.5 and 3)
  --modified-z M                modified z-score cut-off (default 3.5); --z Z: z-score cut-off (default 3)
  --grubbs-alpha A              Grubbs' test level (default 0.05); --esd-max N, --esd-alpha A: generalized ESD
  --near-constant S             share of one value that makes a column near-constant (default 0.99)
  --level COLUMN=LEVEL          set a column's level: nominal, ordinal, interval or ratio (repeatable)
  --type COLUMN=TYPE            set a column's type: integer, decimal, boolean, date, datetime, text
  --metadata PATH               CSV on the Web metadata (default: FILE-metadata.json or csv-metadata.json)
  --no-metadata                 do not look for metadata beside the file
  --fail-on LIST                exit 1 when any of: flags, invalid, constraints
Other
  --workers N                   threads that profile byte ranges of a UTF-8 file in parallel
                                (default: 1 below 64 MB, else 2 when the machine has 2 cores)
  --count-by-text               look every number up by its text as it is read, not by value
                                afterwards (slower; the same profile under the distinct cap)
  -q, --quiet                   no progress on stderr
  -h, --help, --version

Exit status: 0 done, 1 a --fail-on condition was met, 2 unreadable input, bad options, or reading
stopped at the memory limit (the partial profile is still printed).
`;

const FORMATS = ['json', 'markdown', 'text'];
const THRESHOLDS: Record<string, string> = {
  '--tukey-k': 'tukeyK', '--tukey-far-k': 'tukeyFarK', '--modified-z': 'modifiedZThreshold', '--z': 'zThreshold',
  '--grubbs-alpha': 'grubbsAlpha', '--esd-max': 'esdMaxOutliers', '--esd-alpha': 'esdAlpha', '--near-constant': 'nearConstantShare',
};
const FAIL_ON = ['flags', 'invalid', 'constraints'];

function whole(name: string, v: string, min: number): number {
  if (!/^\d+$/.test(v) || Number(v) < min) throw new Error(`${name}: expected a whole number of at least ${min}, got "${v}"`);
  return Number(v);
}

export function parseArgs(argv: string[]): CliArgs {
  const a: CliArgs = { format: 'text', groupBy: [], noMetadata: false, failOn: [], quiet: false, help: false, version: false, thresholds: {}, levels: {}, types: {} };
  for (let i = 0; i < argv.length; i++) {
    const word = argv[i]!;
    const eq = word.startsWith('--') ? word.indexOf('=') : -1;
    const name = eq > 0 ? word.slice(0, eq) : word;
    const inline = eq > 0 ? word.slice(eq + 1) : undefined;
    const value = (): string => {
      if (inline !== undefined) return inline;
      const v = argv[++i];
      if (v === undefined) throw new Error(`${name}: expects a value`);
      return v;
    };
    switch (name) {
      case '-h': case '--help': a.help = true; break;
      case '--version': a.version = true; break;
      case '-q': case '--quiet': a.quiet = true; break;
      case '--format': {
        const f = value();
        if (!FORMATS.includes(f)) throw new Error(`--format: expected json, markdown or text, got "${f}"`);
        a.format = f as CliArgs['format'];
        break;
      }
      case '--bins': a.bins = value(); break;
      case '--edges': {
        const e = value();
        if (e !== 'nice' && e !== 'exact') throw new Error(`--edges: expected nice or exact, got "${e}"`);
        a.edges = e;
        break;
      }
      case '--delimiter': a.delimiter = value(); break;
      case '--quote': a.quote = value(); break;
      case '--encoding': a.encoding = value().toLowerCase(); break;
      case '--header': a.header = true; break;
      case '--no-header': a.header = false; break;
      case '--decimal-comma': a.decimal = ','; break;
      case '--group-by': a.groupBy.push(value()); break;
      case '--metadata': a.metadata = value(); break;
      case '--no-metadata': a.noMetadata = true; break;
      case '--count-by-text': a.countByText = true; break;
      case '--rules': a.rules = value(); break;
      case '--fail-on': {
        for (const f of value().split(',').map((s) => s.trim()).filter(Boolean)) {
          if (!FAIL_ON.includes(f)) throw new Error(`--fail-on: expected flags, invalid or constraints, got "${f}"`);
          a.failOn.push(f);
        }
        break;
      }
      case '--quantile-type': a.quantileType = whole('--quantile-type', value(), 1); break;
      case '--top': a.top = whole('--top', value(), 1); break;
      case '--max-flags': a.maxFlags = whole('--max-flags', value(), 1); break;
      case '--tukey-k': case '--tukey-far-k': case '--modified-z': case '--z': case '--grubbs-alpha':
      case '--esd-max': case '--esd-alpha': case '--near-constant': {
        const v = value();
        const x = Number(v);
        if (v.trim() === '' || !Number.isFinite(x) || x <= 0) throw new Error(`${name}: expected a positive number, got "${v}"`);
        a.thresholds[THRESHOLDS[name]!] = x;
        break;
      }
      case '--level': case '--type': {
        const v = value();
        const eq = v.lastIndexOf('=');
        if (eq <= 0) throw new Error(`${name}: expected COLUMN=${name === '--level' ? 'LEVEL' : 'TYPE'}, got "${v}"`);
        (name === '--level' ? a.levels : a.types)[v.slice(0, eq)] = v.slice(eq + 1).trim();
        break;
      }
      case '--max-records': a.maxRecords = whole('--max-records', value(), 1); break;
      case '--memory-limit': a.memoryLimit = whole('--memory-limit', value(), 0); break;
      case '--exact-limit': a.exactLimit = whole('--exact-limit', value(), 1); break;
      case '--significant-digits': a.significantDigits = whole('--significant-digits', value(), 1); break;
      case '--workers': a.workers = whole('--workers', value(), 1); break;
      case '--missing': a.missing = ['', ...value().split(',')]; break;
      default:
        if (word.startsWith('-') && word !== '-') throw new Error(`${word}: unknown option (try --help)`);
        if (a.file !== undefined) throw new Error(`expected one input file, got "${a.file}" and "${word}"`);
        a.file = word;
    }
  }
  return a;
}
