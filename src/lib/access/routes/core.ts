/** Shell, accounts, health and the computation API. */
import { ALL, type RouteTable } from './shared';
import { mayAdminister } from '../policies';

export const CORE_ROUTES: RouteTable = {
  '/(app)': { sample: '/', methods: { GET: 'signedIn' } },
  '/signin': { sample: '/signin', methods: { GET: 'public', POST: 'public' } },
  '/signout': { sample: '/signout', methods: { GET: 'public', POST: 'signedIn' } },
  '/invite/[token]': { sample: '/invite/nonexistent-token', methods: { GET: 'public', POST: 'public' } },
  '/(app)/profile': { sample: '/profile', methods: { GET: 'signedIn', POST: 'signedIn' }, nav: { label: 'Profile & tokens', order: 90 } },
  '/(app)/admin/users': {
    sample: '/admin/users',
    methods: { GET: mayAdminister.roles, POST: mayAdminister.roles },
    nav: { label: 'People', order: 80 }
  },
  '/api/health': { sample: '/api/health', methods: { GET: 'public' } },
  '/api/v1/me': { sample: '/api/v1/me', methods: { GET: ALL } },
  '/api/v1/evaluate': { sample: '/api/v1/evaluate', methods: { POST: ALL } },
  '/api/v1/mix': { sample: '/api/v1/mix', methods: { POST: ALL } },
  '/api/v1/solve': { sample: '/api/v1/solve', methods: { POST: ALL } },
  '/api/v1/solve/trade-off': { sample: '/api/v1/solve/trade-off', methods: { POST: ALL } },
  '/api/v1/correct': { sample: '/api/v1/correct', methods: { POST: ALL } },
  '/api/v1/yield-predictions': { sample: '/api/v1/yield-predictions', methods: { POST: ALL } }
};
