import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

import { DuplicatesPanel } from '../duplicates-panel/duplicates-panel';
import { ExportPanel } from '../export-panel/export-panel';
import { ImportPanel } from '../import-panel/import-panel';

/** Settings › Your data: take the journal away, bring data in, tidy duplicates. */
@Component({
  selector: 'll-your-data-page',
  imports: [RouterLink, MatIconModule, ExportPanel, ImportPanel, DuplicatesPanel],
  templateUrl: './your-data-page.html',
  styleUrl: './your-data-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class YourDataPage {}
