/** How a CSV file is read; the server guesses each from the first lines, the user can override. */
export interface ReadOptions {
  delimiter: Delimiter;
  header: boolean;
  decimal: '.' | ',';
}

export const DELIMITERS = [',', ';', '\t', '|'] as const;
export type Delimiter = (typeof DELIMITERS)[number];

export const DELIMITER_LABEL: Record<Delimiter, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab', '|': 'vertical bar' };
