import { LessonListQuerySchema, type LessonListQuery } from '@core/contracts';

const DEFAULTS = LessonListQuerySchema.parse({});
const shape = LessonListQuerySchema.shape;

function read<T>(
  params: URLSearchParams,
  key: keyof typeof shape,
  schema: { safeParse: (value: unknown) => { success: boolean; data?: T } },
) {
  const raw = params.get(key);
  if (raw === null || raw.trim() === '') return undefined;
  const parsed = schema.safeParse(raw);
  return parsed.success ? parsed.data : undefined;
}

/**
 * The lessons list's search, tag, owner, state and sort, read from the page URL so a reload, a shared link or
 * the back button keeps them. A value the contract does not know (an edited or outdated link) is dropped.
 */
export function readLessonFilters(params: URLSearchParams): LessonListQuery {
  return {
    q: read(params, 'q', shape.q) || undefined,
    tag: read(params, 'tag', shape.tag) || undefined,
    owner: read(params, 'owner', shape.owner),
    state: read(params, 'state', shape.state),
    sort: read(params, 'sort', shape.sort) ?? DEFAULTS.sort,
  };
}

/** The URL search params for these filters; the default sort is left out so a plain link stays plain. */
export function writeLessonFilters(filters: LessonListQuery): URLSearchParams {
  const params = new URLSearchParams();
  const q = filters.q?.trim();
  if (q) params.set('q', q);
  if (filters.tag) params.set('tag', filters.tag);
  if (filters.owner) params.set('owner', filters.owner);
  if (filters.state) params.set('state', filters.state);
  if (filters.sort !== DEFAULTS.sort) params.set('sort', filters.sort);
  return params;
}

/** Whether any filter narrows the list (the empty state then says "nothing matches", not "no lessons yet"). */
export function isFiltered(filters: LessonListQuery): boolean {
  return Boolean(filters.q || filters.tag || filters.owner || filters.state);
}
