import type { Href } from 'expo-router';

/** The app's page of one target (its convention fingerprint and the functions it lacks): `/libraries/target?name=…`. */
export function targetPageHref(name: string): Href {
  return `/libraries/target?${new URLSearchParams({ name }).toString()}`;
}
