import { CreateUsers1764633600000 } from './1764633600000-create-users';
import { CreateAuth1764720000000 } from './1764720000000-create-auth';
import { CreateSync1764806400000 } from './1764806400000-create-sync';
import { CreateUploads1764892800000 } from './1764892800000-create-uploads';
import { Library1764979200000 } from './1764979200000-library';
import { Journal1765065600000 } from './1765065600000-journal';
import { Sessions1765152000000 } from './1765152000000-sessions';
import { Goals1765238400000 } from './1765238400000-goals';
import { AttemptCounts1765324800000 } from './1765324800000-attempt-counts';
import { SetFields1765411200000 } from './1765411200000-set-fields';
import { MergeableTexts1765411201000 } from './1765411201000-mergeable-texts';
import { DeviceIds1765411202000 } from './1765411202000-device-ids';
import { Hardening1765411215000 } from './1765411215000-hardening';
import { CatalogueCache1765412022000 } from './1765412022000-catalogue-cache';
import { Loans1765500003000 } from './1765500003000-loans';
import { Circles1765500004000 } from './1765500004000-circles';
import { ReaderSettings1765500007000 } from './1765500007000-reader-settings';

/** Migrations in the order they run; a new one is appended, never edited once landed. */
export const migrations = [
  CreateUsers1764633600000,
  CreateAuth1764720000000,
  CreateSync1764806400000,
  CreateUploads1764892800000,
  Library1764979200000,
  Journal1765065600000,
  Sessions1765152000000,
  Goals1765238400000,
  AttemptCounts1765324800000,
  SetFields1765411200000,
  MergeableTexts1765411201000,
  DeviceIds1765411202000,
  Hardening1765411215000,
  CatalogueCache1765412022000,
  Loans1765500003000,
  Circles1765500004000,
  ReaderSettings1765500007000,
];
