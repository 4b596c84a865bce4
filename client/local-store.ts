/** Local storage where there is one (the web) and it answers; null elsewhere, or when the browser refuses it. */
export function localStore(): Storage | null {
  try {
    return typeof window !== 'undefined' && window.localStorage ? window.localStorage : null;
  } catch {
    return null;
  }
}
