import { RecordingListQuerySchema, type RecordingListQuery } from '@core/contracts';

const DEFAULTS = RecordingListQuerySchema.parse({});
const shape = RecordingListQuerySchema.shape;

/**
 * The library's search, state, owner and sort, read from the page URL so a reload or the back button keeps
 * them. A value the contract does not know (an edited or outdated link) falls back to its default.
 */
export function readLibraryFilters(params: URLSearchParams): RecordingListQuery {
  const read = <T>(key: keyof typeof shape, schema: { safeParse: (value: unknown) => { success: boolean; data?: T } }) => {
    const raw = params.get(key);
    if (raw === null) return undefined;
    const parsed = schema.safeParse(raw);
    return parsed.success ? parsed.data : undefined;
  };
  const q = read('q', shape.q);
  return {
    q: q ? q : undefined,
    state: read('state', shape.state),
    owner: read('owner', shape.owner) ?? DEFAULTS.owner,
    sort: read('sort', shape.sort) ?? DEFAULTS.sort,
  };
}

/** The URL search params for these filters; defaults are left out so a plain link stays plain. */
export function writeLibraryFilters(filters: RecordingListQuery): URLSearchParams {
  const params = new URLSearchParams();
  const q = filters.q?.trim();
  if (q) params.set('q', q);
  if (filters.state) params.set('state', filters.state);
  if (filters.owner !== DEFAULTS.owner) params.set('owner', filters.owner);
  if (filters.sort !== DEFAULTS.sort) params.set('sort', filters.sort);
  return params;
}
