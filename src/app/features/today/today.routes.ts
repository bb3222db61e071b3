import type { Routes } from '@angular/router';

import { Today } from './today';

/**
 * `/today`: what the reader is reading and their reading log. Today is the signed-in first screen,
 * so its page comes in this lazy chunk rather than one more behind it (a round trip less at start).
 */
export default [{ path: '', title: 'Today · Lamplight', component: Today }] satisfies Routes;
