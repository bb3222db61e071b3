import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';

import type { TextVersionsResponse } from '@shared/api/text-history';

/** The server's kept versions of a page's text: online only, so the page history asks when opened. */
@Injectable({ providedIn: 'root' })
export class TextHistoryApi {
  private readonly http = inject(HttpClient);

  pageVersions(pageId: string): Promise<TextVersionsResponse> {
    return firstValueFrom(this.http.get<TextVersionsResponse>(`/api/texts/notebookPages/${encodeURIComponent(pageId)}/body/versions`));
  }
}
