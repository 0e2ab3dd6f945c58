export { archiveMemo, createMemo, duplicateMemo, memoInLab, renameMemo, saveMemo, searchMemos, snippet, type MemoSearchHit } from './service';
export { blocksOf, checkDoc, docToYUpdate, emptyDoc, memoSchema, YJS_FIELD } from './document';
