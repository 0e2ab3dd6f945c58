/** How a CSV file is read; the server guesses each from the first lines, the user can override. */
export interface ReadOptions {
  delimiter: Delimiter;
  header: boolean;
  decimal: '.' | ',';
}

export const DELIMITERS = [',', ';', '\t', '|'] as const;
export type Delimiter = (typeof DELIMITERS)[number];

export const DELIMITER_LABEL: Record<Delimiter, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab', '|': 'vertical bar' };

/** The delimiters by name, as the API takes them (a tab is awkward in a URL). */
export const DELIMITER_BY_NAME = { comma: ',', semicolon: ';', tab: '\t', pipe: '|' } as const satisfies Record<string, Delimiter>;
export type DelimiterName = keyof typeof DELIMITER_BY_NAME;
export const DELIMITER_NAMES = Object.keys(DELIMITER_BY_NAME) as DelimiterName[];
export function delimiterName(d: Delimiter): DelimiterName {
  return DELIMITER_NAMES.find((n) => DELIMITER_BY_NAME[n] === d)!;
}
