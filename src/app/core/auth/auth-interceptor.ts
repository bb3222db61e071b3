import { HttpErrorResponse, type HttpInterceptorFn, type HttpRequest } from '@angular/common/http';
import { inject } from '@angular/core';
import { catchError, from, switchMap, throwError } from 'rxjs';

import { Auth } from './auth';

/** API routes that must go without a bearer token. */
const PUBLIC_ROUTES = /^\/api\/(health|auth\/(login|register|refresh|verify-email|password-reset\/.*))$/;

const withBearer = (req: HttpRequest<unknown>, token: string | null) => (token ? req.clone({ setHeaders: { Authorization: `Bearer ${token}` } }) : req);

/**
 * Adds the bearer token to API calls. On a 401 it refreshes once and retries once; if the
 * refresh is refused the reader is asked to sign in again (local data untouched). A failed
 * network request is passed on as it is: offline never signs anyone out.
 */
export const authInterceptor: HttpInterceptorFn = (req, next) => {
  const path = req.url.replace(/^https?:\/\/[^/]+/, '').split('?')[0]!;
  if (!path.startsWith('/api/') || PUBLIC_ROUTES.test(path)) return next(req);
  const auth = inject(Auth);
  let sentWith: string | null = null;
  return from(auth.freshAccessToken()).pipe(
    switchMap((token) => next(withBearer(req, (sentWith = token)))),
    catchError((error: unknown) => {
      if (!(error instanceof HttpErrorResponse) || error.status !== 401) return throwError(() => error);
      return from(auth.refresh(sentWith ?? undefined).catch(() => null)).pipe(
        switchMap((token) => (token ? next(withBearer(req, token)) : throwError(() => error))),
      );
    }),
  );
};
