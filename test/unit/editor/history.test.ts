import { describe, expect, it } from 'vitest';
import { HISTORY_LIMIT, record, redo, startHistory, undo } from '@shared/editor/history';

describe('edit history', () => {
  it('undoes and redoes in order, and a new edit drops what was undone', () => {
    let h = record(record(startHistory('a'), 'b'), 'c');
    h = undo(h);
    expect(h.present).toBe('b');
    h = undo(h);
    expect(h.present).toBe('a');
    expect(undo(h)).toBe(h);
    h = redo(h);
    expect(h.present).toBe('b');
    h = record(h, 'x');
    expect(h.future).toEqual([]);
    expect(redo(h)).toBe(h);
  });

  it('collapses edits of one group (typing in a field) into one undo step', () => {
    let h = startHistory('');
    for (const text of ['4', '48', '480']) h = record(h, text, 'form:coil');
    expect(h.past).toEqual(['']);
    expect(undo(h).present).toBe('');
    h = record(h, 'other', 'form:spark');
    expect(h.past).toEqual(['', '480']);
  });

  it('keeps at most HISTORY_LIMIT steps back', () => {
    let h = startHistory(0);
    for (let i = 1; i <= HISTORY_LIMIT + 10; i++) h = record(h, i);
    expect(h.past.length).toBe(HISTORY_LIMIT);
  });
});
