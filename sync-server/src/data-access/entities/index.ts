import { BookStatusChangeRow } from './book-status-change.entity';
import { BookRow } from './book.entity';
import { FavouriteRow } from './favourite.entity';
import { LabelRow } from './label.entity';
import { MonthPickRow } from './month-pick.entity';
import { NotebookPageRow } from './notebook-page.entity';
import { NotebookRow } from './notebook.entity';
import { PageTemplateRow } from './page-template.entity';
import { QuoteRow } from './quote.entity';
import { SeriesRow } from './series.entity';
import { SessionRow } from './session.entity';
import { TimerRow } from './timer.entity';
import { ChallengeRow } from './challenge.entity';
import { MonthPlanRow } from './month-plan.entity';
import { YearPlanRow } from './year-plan.entity';
import { ReadingRow } from './reading.entity';
import { ReaderSettingsRow } from './reader-settings.entity';
import { DeviceSession } from './device-session.entity';
import { PasswordReset } from './password-reset.entity';
import { RefreshToken } from './refresh-token.entity';
import { Upload } from './upload.entity';
import { UploadOwner } from './upload-owner.entity';
import { User } from './user.entity';

/** The entity of each synced collection, by collection name (its table has the same name). */
export const SYNCED_ENTITIES = {
  books: BookRow,
  bookStatusChanges: BookStatusChangeRow,
  readings: ReadingRow,
  series: SeriesRow,
  quotes: QuoteRow,
  notebooks: NotebookRow,
  notebookPages: NotebookPageRow,
  pageTemplates: PageTemplateRow,
  favourites: FavouriteRow,
  monthPicks: MonthPickRow,
  labels: LabelRow,
  sessions: SessionRow,
  timers: TimerRow,
  yearPlans: YearPlanRow,
  monthPlans: MonthPlanRow,
  challenges: ChallengeRow,
  readerSettings: ReaderSettingsRow,
} as const;

/** Every entity the DataSource knows; add new ones here. Uploads are not synced rows: they have their own API. */
export const entities = [User, DeviceSession, RefreshToken, PasswordReset, Upload, UploadOwner, ...Object.values(SYNCED_ENTITIES)];
