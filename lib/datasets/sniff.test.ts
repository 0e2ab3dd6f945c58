import { describe, expect, it } from 'vitest';
import { completeLines, guessOptions } from './sniff';

describe('guessing how to read a file', () => {
  it('finds the delimiter from a consistent field count', () => {
    expect(guessOptions('a;b;c\n1;2;3\n4;5;6\n').delimiter).toBe(';');
    expect(guessOptions('a\tb\n1\t2\n').delimiter).toBe('\t');
    expect(guessOptions('a|b\n1|2\n').delimiter).toBe('|');
    // Commas inside the numbers of a semicolon file do not fool it.
    expect(guessOptions('site;v\nup;2,5\ndown;3,75\n').delimiter).toBe(';');
  });

  it('takes the first row as a header only when it holds no numbers or dates', () => {
    expect(guessOptions('site,v\nup,1\n').header).toBe(true);
    expect(guessOptions('2026-03-01,1\n2026-03-02,2\n').header).toBe(false);
    expect(guessOptions('up,1\ndown,2\n').header).toBe(false);
  });

  it('keeps what the user chose over the guess', () => {
    expect(guessOptions('a;b\n1;2\n', { delimiter: ',', header: false, decimal: ',' })).toMatchObject({ delimiter: ',', header: false, decimal: ',' });
  });

  it('reports the line ending', () => {
    expect(guessOptions('a,b\r\n1,2\r\n').newline).toBe('\r\n');
    expect(guessOptions('a,b\n1,2\n').newline).toBe('\n');
  });

  it('looks only at complete lines of a sample cut from a longer file', () => {
    expect(completeLines('a,b\n1,2\n3,', false)).toBe('a,b\n1,2\n');
    expect(completeLines('a,b\n1,2\n3,', true)).toBe('a,b\n1,2\n3,');
  });
});
