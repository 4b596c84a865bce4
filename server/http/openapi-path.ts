/**
 * An Express route path as an OpenAPI path: mount paths joined, `:name` written `{name}`, and no
 * trailing slash (Express is not strict about it, so `/api/plans/` and `/api/plans` are one route).
 */
export function openApiPath(...parts: string[]): string {
  const joined = parts.join('/').replace(/\/+/g, '/').replace(/\/$/, '');
  return (joined || '/').replace(/:([A-Za-z0-9_]+)/g, '{$1}');
}
