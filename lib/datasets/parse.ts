import Papa from 'papaparse';
import { AppError } from '@/lib/errors';
import { ColumnBuilder, type ParsedColumn } from './column-builder';
import { Utf8Reader } from './decode';
import { lineError, tableError } from './errors';
import { MAX_COLUMN_NAME, MAX_COLUMNS, MAX_RECORD_CHARS, MAX_ROWS, MAX_UPLOAD_BYTES } from './limits';
import { DELIMITER_LABEL, type ReadOptions } from './options';
import { guessOptions, SNIFF_CHARS, type Newline } from './sniff';
import { TimeSlicer } from './time-slicer';

export interface ParsedTable {
  columns: ParsedColumn[];
  rowCount: number;
  /** The options the file was read with (guessed or given). */
  options: ReadOptions;
  bytes: number;
}

export interface ParseProgress {
  bytes: number;
  rows: number;
}

export interface ParseHooks {
  onProgress?: (p: ParseProgress) => void;
  maxBytes?: number;
}

/**
 * Reads a CSV byte stream into typed columns. Streaming: the bytes are checked and decoded
 * chunk by chunk (lib/datasets/decode.ts), cut into records by papaparse's core parser
 * (records split across chunks are carried over), and each field goes straight into its
 * column's builder, so memory is the parsed table, not the file. Yields to the event loop
 * every ~15 ms, so a 50 MB file does not stall the server.
 *
 * Throws an AppError (`invalid:dataset`, path `line.N`) naming the line for: binary or
 * non-UTF-8 bytes, a record with a different number of fields than the first, a quote
 * left open, a duplicate column name, an empty file, a file with no data rows, and a table
 * without a numeric column. Nothing is stored by this function, so a bad file leaves no trace.
 */
export async function parseCsv(source: AsyncIterable<Uint8Array>, given: Partial<ReadOptions> = {}, hooks: ParseHooks = {}): Promise<ParsedTable> {
  const maxBytes = hooks.maxBytes ?? MAX_UPLOAD_BYTES;
  const reader = new Utf8Reader();
  const slicer = new TimeSlicer();
  let records: RecordReader | null = null;
  let pending = '';
  let lastProgress = 0;
  for await (const chunk of source) {
    if (reader.bytes + chunk.length > maxBytes) throw new AppError('too_large:dataset', `The file is larger than ${Math.round(maxBytes / 1024 / 1024)} MB, the most one upload may hold.`, 'file');
    const text = reader.push(chunk);
    if (records) records.feed(text);
    else {
      pending += text;
      if (pending.length >= SNIFF_CHARS) {
        records = new RecordReader(guessOptions(pending, given, false));
        records.feed(pending);
        pending = '';
      }
    }
    if ((await slicer.maybeYield()) && hooks.onProgress && performance.now() - lastProgress > 100) {
      lastProgress = performance.now();
      hooks.onProgress({ bytes: reader.bytes, rows: records?.rowCount ?? 0 });
    }
  }
  const tail = reader.end();
  if (!records) {
    pending += tail;
    if (pending.trim() === '') throw tableError(reader.bytes === 0 ? 'The file is empty.' : 'The file holds only blank lines.');
    records = new RecordReader(guessOptions(pending, given, true));
    records.feed(pending);
  } else records.feed(tail);
  const table = records.finish(reader.bytes);
  hooks.onProgress?.({ bytes: reader.bytes, rows: table.rowCount });
  return table;
}

/** Parses CSV text already in memory (a paste). */
export function parseCsvText(text: string, given: Partial<ReadOptions> = {}): Promise<ParsedTable> {
  return parseCsv(
    (async function* () {
      yield new TextEncoder().encode(text);
    })(),
    given,
  );
}

/** Cuts text into records with papaparse and hands the fields to the column builders. */
class RecordReader {
  private readonly parser: { parse(input: string, baseIndex: number, ignoreLastRow: boolean): Papa.ParseResult<string[]> };
  private readonly options: ReadOptions;
  private readonly newline: Newline;
  private partial = '';
  private line = 1;
  private builders: ColumnBuilder[] | null = null;
  private width = 0;
  private firstLine = 1;
  private headerNames: string[] = [];
  rowCount = 0;

  constructor(options: ReadOptions & { newline: Newline }) {
    const { newline, ...rest } = options;
    this.options = rest;
    this.newline = newline;
    // Papa.Parser is papaparse's core record splitter (exported; the streamers use it the same
    // way): parse(text, 0, true) returns the complete records and a cursor after the last one.
    const PapaParser = (Papa as unknown as { Parser: new (config: object) => RecordReader['parser'] }).Parser;
    this.parser = new PapaParser({ delimiter: options.delimiter, newline });
  }

  feed(text: string) {
    const input = this.partial + text;
    if (!input) return;
    const res = this.parser.parse(input, 0, true);
    this.take(res, input.includes('"'));
    this.partial = input.slice(res.meta.cursor);
    if (this.partial.length > MAX_RECORD_CHARS) {
      throw lineError(this.line, `The record starting on line ${this.line} runs on for more than ${MAX_RECORD_CHARS / 1024 / 1024} MB: a closing quote (") is probably missing on that line.`);
    }
  }

  finish(bytes: number): { columns: ParsedColumn[]; rowCount: number; options: ReadOptions; bytes: number } {
    if (this.partial) {
      const res = this.parser.parse(this.partial, 0, false);
      this.take(res, this.partial.includes('"'));
      this.partial = '';
    }
    if (!this.builders) throw tableError('The file holds only blank lines.');
    if (this.rowCount === 0) throw lineError(this.firstLine, `The file has a header (line ${this.firstLine}) but no data rows below it.`);
    let columns = this.builders.map((b) => b.finish());
    // A trailing delimiter on every line makes an unnamed, empty last column: not data.
    columns = columns.filter((c, j) => !(this.headerNames[j] === '' && c.missing === this.rowCount));
    if (!columns.some((c) => c.type === 'number')) {
      const found = columns.map((c) => `${c.name} (${c.type})`).join(', ');
      const hint = columns.find((c) => c.type !== 'number' && c.mostlyNumbers);
      const mostly = hint && hint.type !== 'number' ? hint.mostlyNumbers : undefined;
      const why = hint && mostly ? ` Column "${hint.name}" is mostly numbers, but line ${mostly.firstLine} holds "${mostly.example}".` : '';
      throw tableError(`No column holds only numbers, and Margin needs at least one numeric column to estimate from. Columns found: ${found}.${why}`, 'columns');
    }
    return { columns, rowCount: this.rowCount, options: this.options, bytes };
  }

  private take(res: Papa.ParseResult<string[]>, quoted: boolean) {
    const rows = res.data;
    // papaparse reports quote errors by the index of the record they occur in.
    const quoteErrors = new Map<number, string>();
    for (const e of res.errors) if (!quoteErrors.has(e.row ?? rows.length)) quoteErrors.set(e.row ?? rows.length, e.code);
    for (let r = 0; r < rows.length; r++) {
      const row = rows[r];
      const line = this.line;
      const quoteError = quoteErrors.get(r);
      if (quoteError) throw quoteProblem(quoteError, line);
      let extra = 0;
      if (quoted) for (const f of row) extra += countNewlines(f, this.newline);
      this.line += 1 + extra;
      if (row.length === 1 && row[0].trim() === '') continue;
      if (!this.builders) {
        this.start(row, line);
        if (this.options.header) continue;
      }
      if (row.length !== this.width) {
        throw lineError(
          line,
          `Line ${line} has ${row.length} field${row.length === 1 ? '' : 's'}, but line ${this.firstLine} has ${this.width}. Check the delimiter (now ${DELIMITER_LABEL[this.options.delimiter]}) or put quotes around fields that contain it.`,
        );
      }
      const b = this.builders!;
      for (let j = 0; j < row.length; j++) b[j].push(row[j], line);
      if (++this.rowCount > MAX_ROWS) throw lineError(line, `The file has more than ${MAX_ROWS.toLocaleString('en')} data rows, the most one dataset may hold.`);
    }
    // An error in the unfinished last record: an open quote at the end of the file is final;
    // anything else is looked at again once the record is complete.
    if (quoteErrors.get(rows.length) === 'MissingQuotes') throw quoteProblem('MissingQuotes', this.line);
  }

  private start(first: string[], line: number) {
    this.firstLine = line;
    this.width = first.length;
    if (first.length > MAX_COLUMNS) throw lineError(line, `Line ${line} has ${first.length} columns; a dataset may have at most ${MAX_COLUMNS}.`);
    const names = this.options.header ? first.map((f) => f.trim()) : first.map(() => '');
    this.headerNames = names;
    const seen = new Map<string, number>();
    const finalNames = names.map((n, j) => n || `column_${j + 1}`);
    finalNames.forEach((n, j) => {
      if (n.length > MAX_COLUMN_NAME) throw lineError(line, `Line ${line}: the name of column ${j + 1} is longer than ${MAX_COLUMN_NAME} characters.`);
      const before = seen.get(n);
      if (before !== undefined) throw lineError(line, `Line ${line} names two columns "${n}" (columns ${before + 1} and ${j + 1}); column names must be different.`);
      seen.set(n, j);
    });
    this.builders = finalNames.map((n) => new ColumnBuilder(n, this.options.decimal));
  }
}

function quoteProblem(code: string, line: number) {
  if (code === 'MissingQuotes') return lineError(line, `Line ${line} opens a quoted field (") that is never closed.`);
  return lineError(line, `Line ${line} has a quote (") in the wrong place: a field that starts with a quote must end with one, and a quote inside it is written twice ("").`);
}

function countNewlines(field: string, newline: Newline): number {
  const ch = newline === '\r' ? '\r' : '\n';
  let n = 0;
  for (let i = field.indexOf(ch); i !== -1; i = field.indexOf(ch, i + 1)) n++;
  return n;
}
