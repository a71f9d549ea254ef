import { describe, expect, it } from 'vitest';
import { modelListQuerySchema } from '#shared/schemas/models.ts';
import { listSearchString } from './get-list.ts';
import { isNarrowed, readListQuery, writeListQuery } from './list-search-params.ts';

describe('list state in the URL', () => {
  it('reads the query with the schema, defaults filling the gaps', () => {
    const q = readListQuery(new URLSearchParams('tab=models&sort=maker&dir=desc&page=3&category=mat'), modelListQuerySchema);
    expect(q).toEqual({ q: '', sort: 'maker', dir: 'desc', page: 3, pageSize: 25, category: 'mat' });
  });

  it('drops what the schema refuses and keeps the rest', () => {
    const q = readListQuery(new URLSearchParams('sort=colour&page=-2&dir=desc&category=lamp'), modelListQuerySchema);
    expect(q).toEqual({ q: '', sort: 'name', dir: 'desc', page: 1, pageSize: 25 });
  });

  it('writes only what differs from the defaults, keeping other params', () => {
    const params = writeListQuery(
      new URLSearchParams('tab=models&page=4'),
      { q: 'halo', sort: 'name', dir: 'asc', page: 1, pageSize: 50, makerId: 'mk-1' },
      modelListQuerySchema,
    );
    expect(params.toString()).toBe('tab=models&q=halo&pageSize=50&makerId=mk-1');
  });

  it('prefixes the params when two lists share a page', () => {
    const params = writeListQuery(new URLSearchParams(), { sort: 'maker', page: 2 }, modelListQuerySchema, { prefix: 'm.' });
    expect(params.toString()).toBe('m.sort=maker&m.page=2');
    expect(readListQuery(params, modelListQuerySchema, { prefix: 'm.' })).toMatchObject({ sort: 'maker', page: 2 });
    expect(readListQuery(params, modelListQuerySchema)).toMatchObject({ sort: 'name', page: 1 });
  });

  it('tells a narrowed list from a plain one', () => {
    const plain = modelListQuerySchema.parse({});
    expect(isNarrowed(plain)).toBe(false);
    expect(isNarrowed({ ...plain, q: 'halo' })).toBe(true);
    expect(isNarrowed({ ...plain, category: 'cap' })).toBe(true);
    expect(isNarrowed({ ...plain, page: 3 })).toBe(false);
  });

  it('sends every set value to the API in a stable order', () => {
    expect(listSearchString({ sort: 'name', q: '', page: 1, dir: 'asc', pageSize: 25, makerId: undefined })).toBe(
      'dir=asc&page=1&pageSize=25&sort=name',
    );
  });
});
