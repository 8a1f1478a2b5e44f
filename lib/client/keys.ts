/** SWR keys, one place per resource, so a mutation can find what to refresh. */
export const checksKey = (params: Record<string, string | number | undefined>) => {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value !== undefined && value !== "") search.set(key, String(value));
  const query = search.toString();
  return `/api/v1/checks${query ? `?${query}` : ""}`;
};

export const installationsKey = (params: Record<string, string | number | undefined>) => {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value !== undefined && value !== "") search.set(key, String(value));
  const query = search.toString();
  return `/api/v1/installations${query ? `?${query}` : ""}`;
};
