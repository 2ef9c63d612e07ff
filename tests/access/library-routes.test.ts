import { describe, expect, it } from 'vitest';
import { decide, navFor } from '../../src/lib/access/route-table';
import { ROLES } from '../../src/lib/roles';

// Issue 5 role rules: formulators and admins edit the library; technicians and quality read it.
describe('material library role rules', () => {
  const editors = ['formulator', 'admin'] as const;
  const readers = ['technician', 'quality'] as const;

  it('shows "Library" in every role\'s navigation', () => {
    for (const role of ROLES) expect(navFor([role]).some((n) => n.href === '/library' && n.label === 'Library')).toBe(true);
  });

  it('lets every role read the table, the detail pages, files and the API', () => {
    for (const role of ROLES) {
      for (const id of [
        '/(app)/library',
        '/(app)/library/[id]',
        '/(app)/library/[id]/files/[fileId]',
        '/api/v1/phosphors',
        '/api/v1/phosphors/[id]',
        '/api/v1/pumps',
        '/api/v1/pumps/[id]',
        '/api/v1/phosphors/[id]/thermal',
        '/api/v1/pumps/[id]/thermal',
        '/api/v1/pumps/[id]/bins'
      ]) {
        expect(decide(id, 'GET', [role]), `${role} GET ${id}`).toBe('allow');
      }
    }
  });

  it('keeps every change to formulators and admins', () => {
    const changes: [string, string][] = [
      ['/(app)/library/new', 'GET'],
      ['/(app)/library/new', 'POST'],
      ['/(app)/library/[id]', 'POST'],
      ['/(app)/library/[id]/edit', 'GET'],
      ['/(app)/library/[id]/edit', 'POST'],
      ['/(app)/library/[id]/spectrum', 'POST'],
      ['/api/v1/phosphors', 'POST'],
      ['/api/v1/phosphors/[id]', 'PUT'],
      ['/api/v1/phosphors/[id]', 'DELETE'],
      ['/api/v1/phosphors/[id]/spectrum', 'POST'],
      ['/api/v1/pumps', 'POST'],
      ['/api/v1/pumps/[id]', 'PUT'],
      ['/api/v1/pumps/[id]', 'DELETE'],
      ['/api/v1/pumps/[id]/spectrum', 'POST'],
      ['/api/v1/phosphors/[id]/thermal', 'PUT'],
      ['/api/v1/phosphors/[id]/thermal', 'POST'],
      ['/api/v1/pumps/[id]/thermal', 'PUT'],
      ['/api/v1/pumps/[id]/thermal', 'POST'],
      ['/api/v1/pumps/[id]/bins', 'PUT']
    ];
    for (const [id, method] of changes) {
      for (const role of editors) expect(decide(id, method, [role]), `${role} ${method} ${id}`).toBe('allow');
      for (const role of readers) expect(decide(id, method, [role]), `${role} ${method} ${id}`).toBe('forbidden');
      expect(decide(id, method, null)).toBe('signin');
    }
  });
});
