import type { BOOK_COPIES, BOOK_FORMATS, BOOK_STATUSES, RECOMMEND_ANSWERS } from '../../../../shared/sync/schema/collections';
import type { CoverStyle } from './demo-cover';

/** What the reader wrote when a reading ended (finished or given up). */
export interface DemoReview {
  readonly rating?: number;
  readonly summary: string;
  readonly review?: string;
  readonly takeaways?: string;
  readonly recommend: (typeof RECOMMEND_ANSWERS)[number];
  readonly recommendTo?: string;
}

/** One book of the demo library, as written here; `seedDemoLibrary` turns it into synced rows. */
export interface DemoBook {
  readonly title: string;
  readonly subtitle?: string;
  readonly authors: readonly string[];
  readonly format: (typeof BOOK_FORMATS)[number];
  readonly pageCount?: number;
  readonly audioMinutes?: number;
  /** The first 12 digits of the ISBN-13, hyphens allowed; the seed computes the check digit. */
  readonly isbnBody?: string;
  readonly publisher?: string;
  readonly year: number;
  readonly language: string;
  readonly genres: readonly string[];
  readonly tags: readonly string[];
  readonly copy: (typeof BOOK_COPIES)[number];
  /** The style of its generated cover; books without one have no cover. */
  readonly cover?: CoverStyle;
  /**
   * Status changes, oldest first, at 'YYYY-MM-DD HH:MM' UTC; the last is the book's status.
   * Readings follow from them: one starts at 'reading' (unless resuming from 'paused') and ends
   * at 'finished' or 'dnf'.
   */
  readonly history: readonly (readonly [(typeof BOOK_STATUSES)[number], string])[];
  /** One per reading that ended, in order. */
  readonly reviews?: readonly DemoReview[];
  /** Its series (by name, planned number of books) and place in it. */
  readonly series?: { readonly name: string; readonly planned: number; readonly position: number };
}

/*
 * Wren Ashdown's library. Every title, author, publisher and review is invented for Lamplight's
 * demo; none is a real book or person. ISBN bodies use registration groups 978/979 with
 * registrant numbers inside the ranges of the ISBN agency's range table (as isbn3 carries it),
 * and check digits computed by shared/isbn; as with any made-up ISBN, a number may by chance
 * also be some real edition's, so nothing should ever look them up.
 */
export const DEMO_BOOKS: readonly DemoBook[] = [
  {
    title: 'The Cartographer of Small Rains',
    authors: ['Ottoline Greaves'],
    format: 'print',
    pageCount: 344,
    isbnBody: '979-8-4127-0351',
    publisher: 'Harrowgate & Lune',
    year: 2023,
    language: 'en',
    genres: ['Literary fiction'],
    tags: ['book club', 'signed'],
    copy: 'owned',
    cover: 'sun',
    history: [
      ['tbr', '2025-11-20 18:05'],
      ['reading', '2026-01-03 20:10'],
      ['finished', '2026-01-24 21:40'],
    ],
    reviews: [
      {
        rating: 4.5,
        summary: 'A mapmaker charts the weather of one valley and, slowly, her own grief.',
        review:
          'Edith is hired to map where the rain falls in a valley that floods every spring. The maps get stranger as she does. ' +
          'Nothing much happens for a hundred pages and I did not mind at all: the sentences are like walking in fog that lifts ' +
          'just as you stop expecting it to. The ending was one chapter too tidy for me.',
        takeaways: 'Grief has weather. Keep a notebook of small things; it adds up to a map.',
        recommend: 'yes',
        recommendTo: 'Anyone who likes quiet books where the landscape is a character',
      },
    ],
  },
  {
    title: 'A Field Guide to Borrowed Weather',
    authors: ['Nadim Farrow'],
    format: 'print',
    pageCount: 212,
    isbnBody: '979-8-5530-1184',
    publisher: 'Quillmere Press',
    year: 2021,
    language: 'en',
    genres: ['Essays', 'Nature writing'],
    tags: ['library book', 'short chapters'],
    copy: 'library',
    history: [
      ['tbr', '2026-01-28 12:00'],
      ['reading', '2026-02-02 19:30'],
      ['finished', '2026-02-15 20:45'],
    ],
    reviews: [
      {
        rating: 4,
        summary: 'Short essays on weather as something neighbours lend each other.',
        review:
          'Twenty-two essays, none longer than a bus ride. My favourite is the one about a street that shares one umbrella. ' +
          'A few repeat each other, but I read one a night and was sorry to give it back to the library.',
        takeaways: 'Look up more. Talk to the neighbours about the sky, not just about parking.',
        recommend: 'yes',
        recommendTo: 'Walkers, gardeners, people who check the forecast twice',
      },
    ],
  },
  {
    title: 'The Bell Under Ashwater Marsh',
    series: { name: 'The Ashwater Books', planned: 3, position: 1 },
    subtitle: 'Ashwater, Book One',
    authors: ['Juniper Asquith'],
    format: 'ebook',
    pageCount: 398,
    isbnBody: '979-8-88516-020',
    publisher: 'Tidewrack Editions',
    year: 2019,
    language: 'en',
    genres: ['Fantasy'],
    tags: ['ashwater', 'reread', 'comfort read'],
    copy: 'owned',
    cover: 'orbits',
    history: [
      ['tbr', '2025-02-09 17:00'],
      ['reading', '2025-02-12 21:00'],
      ['finished', '2025-03-02 22:15'],
      ['reading', '2026-02-20 21:30'],
      ['finished', '2026-03-08 22:00'],
    ],
    reviews: [
      {
        rating: 4,
        summary: 'A drowned village, a bell that still rings, and a girl who listens.',
        review:
          'Mirren hears the church bell of a village that went under the marsh two hundred years ago. ' +
          'Lovely creepy first half; the politics of the marsh council in the second half slowed it down.',
        recommend: 'yes',
        recommendTo: 'Fantasy readers who like their magic damp and local',
      },
      {
        rating: 4.5,
        summary: 'Better the second time: every clue to book two was there all along.',
        review:
          'Re-read before starting book two. Knowing who rings the bell makes every scene with the ferrywoman ache. ' +
          'The council chapters I skimmed last time are where the whole plot is hiding.',
        takeaways: 'Re-reads are allowed to change your mind.',
        recommend: 'yes',
        recommendTo: 'Anyone who has read it once',
      },
    ],
  },
  {
    title: 'A Ledger of Ashwater Salt',
    series: { name: 'The Ashwater Books', planned: 3, position: 2 },
    subtitle: 'Ashwater, Book Two',
    authors: ['Juniper Asquith'],
    format: 'ebook',
    pageCount: 452,
    isbnBody: '979-8-88516-037',
    publisher: 'Tidewrack Editions',
    year: 2020,
    language: 'en',
    genres: ['Fantasy'],
    tags: ['ashwater'],
    copy: 'owned',
    history: [
      ['tbr', '2025-03-02 22:20'],
      ['reading', '2026-03-09 20:00'],
      ['paused', '2026-03-30 21:00'],
      ['reading', '2026-04-12 19:45'],
      ['finished', '2026-04-26 22:30'],
    ],
    reviews: [
      {
        rating: 3.5,
        summary: 'The salt trade, a missing ledger and too many council meetings.',
        review:
          'I paused it for two weeks in the middle, which says something. The last hundred pages are excellent and ' +
          'the reveal about the ledger is earned, but getting there is a long walk across the salt flats.',
        recommend: 'maybe',
        recommendTo: 'Readers already fond of book one',
      },
    ],
  },
  {
    title: 'The Ashwater Tide-Keepers',
    series: { name: 'The Ashwater Books', planned: 3, position: 3 },
    subtitle: 'Ashwater, Book Three',
    authors: ['Juniper Asquith'],
    format: 'ebook',
    pageCount: 510,
    isbnBody: '979-8-88516-044',
    publisher: 'Tidewrack Editions',
    year: 2022,
    language: 'en',
    genres: ['Fantasy'],
    tags: ['ashwater', 'slow read'],
    copy: 'owned',
    history: [
      ['tbr', '2025-03-02 22:21'],
      ['reading', '2026-11-02 21:10'],
    ],
  },
  {
    title: 'Inspector Halloran and the Lantern Thief',
    series: { name: 'Inspector Halloran', planned: 5, position: 1 },
    authors: ['Amos Tarrant'],
    format: 'audiobook',
    audioMinutes: 562,
    isbnBody: '979-8-2843-0912',
    publisher: 'Brackenmoor Audio',
    year: 2018,
    language: 'en',
    genres: ['Mystery'],
    tags: ['halloran', 'cosy crime', 'commute'],
    copy: 'library',
    history: [
      ['tbr', '2026-04-01 08:10'],
      ['reading', '2026-04-02 08:15'],
      ['finished', '2026-04-19 18:20'],
    ],
    reviews: [
      {
        rating: 4,
        summary: 'A stolen lamp, a harbour town, a detective who hates boats.',
        review:
          'Halloran is grumpy in exactly the right amount and the narrator does every fisherman a different voice. ' +
          'I guessed the thief early but enjoyed being right.',
        recommend: 'yes',
        recommendTo: 'Anyone who wants a gentle mystery for the commute',
      },
    ],
  },
  {
    title: 'Inspector Halloran at Low Water',
    series: { name: 'Inspector Halloran', planned: 5, position: 2 },
    authors: ['Amos Tarrant'],
    format: 'audiobook',
    audioMinutes: 611,
    isbnBody: '979-8-2843-0929',
    publisher: 'Brackenmoor Audio',
    year: 2019,
    language: 'en',
    genres: ['Mystery'],
    tags: ['halloran', 'cosy crime'],
    copy: 'library',
    history: [
      ['tbr', '2026-04-19 18:25'],
      ['reading', '2026-05-04 08:05'],
      ['paused', '2026-06-01 17:50'],
    ],
  },
  {
    title: 'Inspector Halloran Takes the Night Ferry',
    series: { name: 'Inspector Halloran', planned: 5, position: 3 },
    authors: ['Amos Tarrant'],
    format: 'print',
    pageCount: 288,
    isbnBody: '979-8-8123-4410',
    publisher: 'Gannet Row Publishing',
    year: 2024,
    language: 'en',
    genres: ['Mystery'],
    tags: ['halloran', 'cosy crime'],
    copy: 'wishlist',
    history: [['tbr', '2026-06-02 09:00']],
  },
  {
    title: 'Moths of the Copper Stair',
    authors: ['Ilka Morrow'],
    format: 'print',
    pageCount: 276,
    isbnBody: '979-8-6091-2207',
    publisher: 'Small Hours Folio',
    year: 2022,
    language: 'en',
    genres: ['Horror'],
    tags: ['borrowed from Tove'],
    copy: 'borrowed',
    history: [
      ['tbr', '2026-05-10 20:00'],
      ['reading', '2026-05-14 22:30'],
      ['dnf', '2026-05-22 23:10'],
    ],
    reviews: [
      {
        summary: 'Beautiful sentences, but the dread never arrived for me.',
        review: 'Stopped at page 140. The house is wonderful; the people in it never came alive. Giving it back to Tove with thanks.',
        recommend: 'maybe',
        recommendTo: 'Readers who like slow, atmospheric horror more than I do',
      },
    ],
  },
  {
    title: "The Glassblower's Almanac",
    authors: ['Teodor Halvik'],
    format: 'print',
    pageCount: 416,
    isbnBody: '979-8-4127-0368',
    publisher: 'Harrowgate & Lune',
    year: 2020,
    language: 'en',
    genres: ['Historical fiction'],
    tags: ['book club', 'favourite'],
    copy: 'owned',
    cover: 'arches',
    history: [
      ['tbr', '2026-02-20 10:00'],
      ['reading', '2026-05-25 20:00'],
      ['finished', '2026-06-21 21:15'],
    ],
    reviews: [
      {
        rating: 5,
        summary: 'A year in a lagoon glassworks, told month by month like the almanac of the title.',
        review:
          'Each chapter is a month and each month a new piece of glass, and somewhere in October I realised the family ' +
          'was the thing being made. The book club argued about the ending for an hour, which is the best compliment.',
        takeaways: 'Craft is patience made visible. Write things down by the month.',
        recommend: 'yes',
        recommendTo: 'Anyone who loves craft, family sagas, or both',
      },
    ],
  },
  {
    title: 'Under the Heronry',
    authors: ['Perpetua Lindqvist'],
    format: 'print',
    pageCount: 232,
    isbnBody: '979-8-5530-1191',
    publisher: 'Quillmere Press',
    year: 2025,
    language: 'en',
    genres: ['Memoir', 'Nature writing'],
    tags: ['slow read', 'gift from Ada'],
    copy: 'owned',
    history: [
      ['tbr', '2026-07-01 18:00'],
      ['reading', '2026-10-12 19:00'],
    ],
  },
  {
    title: 'What the Ferryman Kept',
    authors: ['Rafferty Quell'],
    format: 'audiobook',
    audioMinutes: 738,
    isbnBody: '979-8-2843-0936',
    publisher: 'Brackenmoor Audio',
    year: 2021,
    language: 'en',
    genres: ['Fantasy'],
    tags: ['walks'],
    copy: 'owned',
    cover: 'bands',
    history: [
      ['tbr', '2026-06-10 12:00'],
      ['reading', '2026-06-22 07:40'],
      ['finished', '2026-07-19 19:05'],
    ],
    reviews: [
      {
        rating: 4.5,
        summary: 'A river ferryman keeps one thing from every passenger; then someone comes back for theirs.',
        review:
          'Twelve hours of folk tale told slowly, best on long walks. The middle section, a list of everything the ferryman ' +
          'kept and why, made me stop on a bridge and just listen.',
        recommend: 'yes',
        recommendTo: 'Fans of folk tales told at length',
      },
    ],
  },
  {
    title: 'Nine Lanterns for Marisol Vey',
    authors: ['Ysolde Pennick'],
    format: 'ebook',
    pageCount: 352,
    isbnBody: '979-8-7342-5506',
    publisher: 'Lanternfield Books',
    year: 2024,
    language: 'en',
    genres: ['Young adult', 'Fantasy'],
    tags: ['holiday', 'comfort read'],
    copy: 'owned',
    cover: 'tiles',
    history: [
      ['tbr', '2026-07-20 10:00'],
      ['reading', '2026-07-28 14:00'],
      ['finished', '2026-08-06 22:50'],
    ],
    reviews: [
      {
        rating: 3.5,
        summary: 'Nine festival lanterns, nine wishes, one very stubborn girl.',
        review: 'Pure holiday reading. Marisol is great company; the romance subplot felt bolted on.',
        recommend: 'maybe',
        recommendTo: 'Teenagers, and adults on a beach',
      },
    ],
  },
  {
    title: 'Practical Tinkering for Nervous Beginners',
    authors: ['Caspian Holloway-Nunes'],
    format: 'print',
    pageCount: 184,
    isbnBody: '979-8-3318-0745',
    publisher: 'Oxbow & Thistle',
    year: 2022,
    language: 'en',
    genres: ['Non-fiction', 'Crafts'],
    tags: ['reference', 'workshop'],
    copy: 'owned',
    history: [
      ['tbr', '2026-03-01 11:00'],
      ['reading', '2026-03-14 10:30'],
      ['paused', '2026-04-04 16:00'],
    ],
  },
  {
    title: 'The Orchard Index',
    authors: ['Bram Okonjo-Vale'],
    format: 'print',
    pageCount: 301,
    isbnBody: '979-8-4127-0375',
    publisher: 'Harrowgate & Lune',
    year: 2025,
    language: 'en',
    genres: ['Literary fiction'],
    tags: ['book club', 'next month'],
    copy: 'owned',
    cover: 'stripes',
    history: [['tbr', '2026-11-18 19:00']],
  },
  {
    title: 'Slow Arithmetic',
    subtitle: 'Essays on Counting, Waiting and Bread',
    authors: ['Marisol Tendeira'],
    format: 'print',
    pageCount: 198,
    isbnBody: '979-8-5530-1207',
    publisher: 'Quillmere Press',
    year: 2017,
    language: 'en',
    genres: ['Essays'],
    tags: ['library book'],
    copy: 'library',
    history: [
      ['tbr', '2026-08-10 12:00'],
      ['reading', '2026-08-12 20:00'],
      ['finished', '2026-08-30 21:00'],
    ],
    reviews: [
      {
        rating: 4,
        summary: 'Essays on the maths of everyday patience, from sourdough to waiting rooms.',
        review:
          'The sourdough essay alone is worth it: fermentation as compound interest. A couple of essays lean on puns, ' +
          'but mostly it is warm and clever without showing off.',
        takeaways: 'Waiting is a kind of counting. Feed the starter.',
        recommend: 'yes',
        recommendTo: 'People who think they hate maths',
      },
    ],
  },
  {
    title: 'La Maison aux Volets Verts',
    authors: ['Solenne Duvignau'],
    format: 'print',
    pageCount: 264,
    isbnBody: '978-2-919972-41',
    publisher: 'Éditions de la Basse Lampe',
    year: 2016,
    language: 'fr',
    genres: ['Literary fiction', 'In French'],
    tags: ['français', 'language practice'],
    copy: 'owned',
    cover: 'sun',
    history: [
      ['tbr', '2026-01-10 15:00'],
      ['reading', '2026-08-31 19:30'],
      ['finished', '2026-09-27 20:10'],
    ],
    reviews: [
      {
        rating: 4,
        summary: 'A house with green shutters and three summers in it; my French held up.',
        review:
          'Read with a pencil and a dictionary for the first fifty pages, then without. Three summers in one family house, ' +
          'each told by a different cousin. Simple enough to follow, rich enough to enjoy.',
        takeaways: 'Reading in French is possible now. Next: something with more dialogue.',
        recommend: 'yes',
        recommendTo: 'French learners past the beginner stage',
      },
    ],
  },
  {
    title: 'Le Cadran des Marées',
    authors: ['Aurélien Castagnac'],
    format: 'ebook',
    pageCount: 318,
    isbnBody: '979-10-92417-08',
    publisher: 'Éditions du Sel Gris',
    year: 2023,
    language: 'fr',
    genres: ['Mystery', 'In French'],
    tags: ['français'],
    copy: 'owned',
    history: [['tbr', '2026-09-28 10:00']],
  },
  {
    title: 'Das Jahr der Kraniche',
    authors: ['Hannelore Vessberg'],
    format: 'print',
    pageCount: 356,
    isbnBody: '978-3-96342-117',
    publisher: 'Verlag Krähenfeld',
    year: 2019,
    language: 'de',
    genres: ['Literary fiction', 'In German'],
    tags: ['deutsch', 'language practice'],
    copy: 'borrowed',
    history: [
      ['tbr', '2026-02-01 12:00'],
      ['reading', '2026-02-05 20:00'],
      ['paused', '2026-02-20 21:00'],
      ['dnf', '2026-06-30 10:00'],
    ],
    reviews: [
      {
        summary: 'Lovely about cranes, but my German was not ready for it.',
        review: 'Got to chapter six. The crane migration passages are gorgeous; the village dialect defeated me. Another year, perhaps.',
        recommend: 'maybe',
        recommendTo: 'Confident German readers who like slow rural novels',
      },
    ],
  },
  {
    title: 'El Jardín de los Relojes Quietos',
    authors: ['Inés Barrancosa'],
    format: 'print',
    pageCount: 240,
    isbnBody: '978-84-96123-57',
    publisher: 'Ediciones Cántaro Azul',
    year: 2021,
    language: 'es',
    genres: ['Magical realism', 'In Spanish'],
    tags: ['español', 'language practice'],
    copy: 'owned',
    cover: 'orbits',
    history: [
      ['tbr', '2026-09-01 18:00'],
      ['reading', '2026-11-20 21:00'],
    ],
  },
  {
    title: 'Starlings Over Dunmere',
    authors: ['Wilhelmina Achterberg'],
    format: 'audiobook',
    audioMinutes: 845,
    isbnBody: '979-8-2843-0943',
    publisher: 'Brackenmoor Audio',
    year: 2020,
    language: 'en',
    genres: ['Historical fiction'],
    tags: ['commute'],
    copy: 'library',
    history: [
      ['tbr', '2026-09-05 09:00'],
      ['reading', '2026-09-06 08:00'],
      ['dnf', '2026-09-19 18:30'],
    ],
    reviews: [
      {
        summary: 'The story may be fine; the narration sent me to sleep on the bus.',
        recommend: 'no',
      },
    ],
  },
  {
    title: "The Tinker's Theorem",
    authors: ['Lowell Pemberthy'],
    format: 'ebook',
    pageCount: 430,
    isbnBody: '979-8-7342-5513',
    publisher: 'Lanternfield Books',
    year: 2022,
    language: 'en',
    genres: ['Science fiction'],
    tags: ['book club'],
    copy: 'owned',
    history: [
      ['tbr', '2026-09-20 12:00'],
      ['reading', '2026-09-21 21:00'],
      ['finished', '2026-10-11 22:40'],
    ],
    reviews: [
      {
        rating: 3,
        summary: 'A repair robot proves a theorem about a ship nobody can fix.',
        review:
          'Big ideas, handled well; people, less so. The robot is the most human character, which may be the point. ' +
          'Good for the book club: we had plenty to disagree about.',
        recommend: 'maybe',
        recommendTo: 'Readers who like ideas more than characters',
      },
    ],
  },
  {
    title: 'Moonlight Accounting',
    authors: ['Greta Fairweather-Oduya'],
    format: 'print',
    pageCount: 320,
    isbnBody: '979-8-6091-2214',
    publisher: 'Small Hours Folio',
    year: 2026,
    language: 'en',
    genres: ['Romance', 'Comedy'],
    tags: ['new this year'],
    copy: 'wishlist',
    history: [['tbr', '2026-10-15 22:00']],
  },
  {
    title: 'Letters from the Lighthouse Exchange',
    authors: ['Edda Marchbanks', 'Tomasz Reiwald'],
    format: 'print',
    pageCount: 288,
    isbnBody: '979-8-3318-0752',
    publisher: 'Oxbow & Thistle',
    year: 2018,
    language: 'en',
    genres: ['Literary fiction', 'Epistolary'],
    tags: ['book club'],
    copy: 'owned',
    cover: 'tiles',
    history: [
      ['tbr', '2026-10-01 19:00'],
      ['reading', '2026-10-13 20:15'],
      ['finished', '2026-10-30 22:05'],
    ],
    reviews: [
      {
        rating: 4.5,
        summary: 'Two lighthouse keepers write to each other across a century.',
        review:
          'Written by two authors, one for each keeper, and you can feel them answering each other. ' +
          'The letter about the winter the lamp went out made me cry on a train.',
        takeaways: 'Write more letters. Keep the ones you get.',
        recommend: 'yes',
        recommendTo: 'Anyone who keeps letters',
      },
    ],
  },
  {
    title: 'A Short History of Long Afternoons',
    authors: ['Pim Vanterpool'],
    format: 'audiobook',
    audioMinutes: 402,
    isbnBody: '979-8-2843-0950',
    publisher: 'Brackenmoor Audio',
    year: 2024,
    language: 'en',
    genres: ['Non-fiction', 'History'],
    tags: ['walks'],
    copy: 'owned',
    history: [
      ['tbr', '2026-11-01 10:00'],
      ['reading', '2026-11-08 15:30'],
    ],
  },
  {
    title: 'The Apiarist of Corran Fell',
    authors: ['Maud Kittredge'],
    format: 'print',
    pageCount: 254,
    isbnBody: '978-0-907441-36',
    publisher: 'Gannet Row Publishing',
    year: 1987,
    language: 'en',
    genres: ['Literary fiction'],
    tags: ['borrowed from Tove', 'old paperback'],
    copy: 'borrowed',
    cover: 'bands',
    history: [
      ['tbr', '2026-10-31 12:00'],
      ['reading', '2026-11-01 21:00'],
      ['finished', '2026-11-15 21:50'],
    ],
    reviews: [
      {
        rating: 4,
        summary: 'A beekeeper on a windy fell, and the village that depends on her hives.',
        review:
          "Tove's copy, with her pencil notes in the margins, which made it a conversation. A small, patient novel; " +
          'the chapter on the swarm is as tense as any thriller.',
        recommend: 'yes',
        recommendTo: 'Fans of small, patient novels',
      },
    ],
  },
  {
    title: 'Rooftop Gardens of an Imaginary City',
    authors: ['Oskar Lindgrave'],
    format: 'print',
    pageCount: 144,
    year: 2025,
    language: 'en',
    genres: ['Art', 'Design'],
    tags: ['zine', 'library book'],
    copy: 'library',
    history: [['tbr', '2026-11-25 17:00']],
  },
  {
    title: 'Knots, Hitches and Other Small Loyalties',
    authors: ['Fenella Strood'],
    format: 'ebook',
    pageCount: 226,
    isbnBody: '979-8-7342-5520',
    publisher: 'Lanternfield Books',
    year: 2023,
    language: 'en',
    genres: ['Short stories'],
    tags: ['between books'],
    copy: 'owned',
    history: [
      ['tbr', '2026-05-01 12:00'],
      ['reading', '2026-07-05 21:00'],
      ['paused', '2026-07-26 20:00'],
    ],
  },
];
