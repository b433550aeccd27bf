import { provideHttpClient, withInterceptors, withXsrfConfiguration } from '@angular/common/http';
import { EnvironmentProviders } from '@angular/core';
import { errorInterceptor } from './error-interceptor';
import { revalidateInterceptor } from './revalidate-interceptor';

/**
 * HttpClient as the API expects it: the XSRF cookie/header pair with Angular's default names
 * (`XSRF-TOKEN` / `X-XSRF-TOKEN`) and readable errors. The XHR backend is kept (no `withFetch`)
 * because only it reports upload progress, which the job import shows. A GET answer with an entity
 * tag is asked for again with If-None-Match (revalidate-interceptor.ts), inside the error handling so
 * that a 304 is never taken for a failure.
 */
export function provideApiHttp(): EnvironmentProviders {
  return provideHttpClient(withXsrfConfiguration({}), withInterceptors([errorInterceptor, revalidateInterceptor]));
}
