import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatToolbarModule } from '@angular/material/toolbar';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';

/** A place in the app the shell links to. */
interface Destination {
  readonly path: string;
  readonly label: string;
  readonly icon: string;
}

/** The app shell: brand bar, main navigation and the routed page. */
@Component({
  selector: 'll-root',
  imports: [RouterOutlet, RouterLink, RouterLinkActive, MatToolbarModule, MatIconModule],
  templateUrl: './app.html',
  styleUrl: './app.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  protected readonly destinations: readonly Destination[] = [
    { path: '/today', label: 'Today', icon: 'wb_twilight' },
    { path: '/library', label: 'Library', icon: 'local_library' },
  ];
}
