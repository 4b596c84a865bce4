import { act, renderHook } from '@testing-library/react';
import { useKeptDraft } from '../../client/use-kept-draft';

const KEY = 'sheetkeeper.suite-draft.u1.new';
const stored = () => JSON.parse(window.localStorage.getItem(KEY) ?? 'null')?.value;

describe('useKeptDraft', () => {
  beforeEach(() => {
    window.localStorage.clear();
    jest.useFakeTimers();
  });
  afterEach(() => jest.useRealTimers());

  it('writes the draft once typing pauses for 400 ms, not at every change', () => {
    const { rerender } = renderHook(({ value }) => useKeptDraft(KEY, { title: '' }, value, true), {
      initialProps: { value: { title: 'C' } },
    });
    act(() => jest.advanceTimersByTime(200));
    rerender({ value: { title: 'Cube' } });
    act(() => jest.advanceTimersByTime(399));
    expect(stored()).toBeUndefined();
    act(() => jest.advanceTimersByTime(1));
    expect(stored()).toEqual({ title: 'Cube' });
  });

  it('writes the last change at once when the page is hidden (a reload or a closed tab) within the pause', () => {
    const { rerender } = renderHook(({ value }) => useKeptDraft(KEY, { title: '' }, value, true), {
      initialProps: { value: { title: 'Cube' } },
    });
    act(() => jest.advanceTimersByTime(400));
    rerender({ value: { title: 'Cube root' } });
    act(() => void window.dispatchEvent(new Event('pagehide')));
    expect(stored()).toEqual({ title: 'Cube root' });
  });

  it('writes nothing for a form that has not been changed, even when the page is hidden', () => {
    renderHook(() => useKeptDraft(KEY, { title: '' }, { title: '' }, false));
    act(() => void window.dispatchEvent(new Event('pagehide')));
    act(() => jest.advanceTimersByTime(1000));
    expect(window.localStorage.getItem(KEY)).toBeNull();
  });
});
