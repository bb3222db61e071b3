import { inject, Injectable } from '@angular/core';

import { instantiateTemplate } from '@shared/journal/instantiate-template';
import { NOTEBOOK_LIMITS } from '@shared/journal/notebook-limits';
import { appendPage, byPosition, movePage } from '@shared/journal/page-order';
import type { TemplateView } from '@shared/journal/starter-templates';
import type { NotebookPage } from '@shared/sync/schema/collections';

import { JournalStore, type RowWrite } from '../../core/data/journal-store';
import { LocalJournal } from '../../core/data/local-journal';
import { ReaderSettings } from '../../core/settings/reader-settings';
import { Deletions } from '../../core/trash/deletions';
import { clip } from './notebook-data';

/** The text of a page or template as the reader typed it. */
export interface PageText {
  readonly title: string;
  readonly body: string;
}

/**
 * Every change to notebooks, their pages and the reader's templates. Each goes through
 * {@link JournalStore} and writes only the fields it means to change.
 */
@Injectable({ providedIn: 'root' })
export class Notebooks {
  private readonly store = inject(JournalStore);
  private readonly journal = inject(LocalJournal);
  private readonly deletions = inject(Deletions);
  private readonly settings = inject(ReaderSettings);

  /** Starts a notebook, optionally about a book; returns its id. */
  createNotebook(title: string, bookId: string | null): Promise<string> {
    return this.store.create('notebooks', { title: title.trim(), bookId });
  }

  /** The pages of a notebook in reading order (deleted ones left out). */
  async pagesOf(notebookId: string): Promise<NotebookPage[]> {
    const pages = await this.journal.requireDb().rows('notebookPages').where('notebookId').equals(notebookId).toArray();
    return byPosition(pages.filter((page) => !page.deleted));
  }

  /**
   * Adds a page at the end of a notebook, blank or from a template whose placeholders are filled
   * for `today` ('YYYY-MM-DD') and the notebook's book; returns the page's id.
   */
  async addPage(notebookId: string, template: TemplateView | null, today: string): Promise<string> {
    const notebook = await this.store.get('notebooks', notebookId);
    const book = notebook?.bookId ? await this.store.get('books', notebook.bookId) : undefined;
    const text = template
      ? instantiateTemplate(template, {
          today,
          bookTitle: book && !book.deleted ? book.title : null,
          bookAuthors: book && !book.deleted ? book.authors : null,
          notebookTitle: notebook?.title,
          locale: this.settings.locale(),
        })
      : { title: '', body: '' };
    const id = crypto.randomUUID();
    // Usually just the new page's position; the other pages too when they needed renumbering.
    const positions = appendPage(await this.pagesOf(notebookId), id);
    await this.store.writeAll([
      ...this.positionWrites(positions.filter((write) => write.id !== id)),
      {
        collection: 'notebookPages',
        rowId: id,
        patch: {
          position: positions.find((write) => write.id === id)!.position,
          notebookId,
          title: blankAsNull(clip(text.title, NOTEBOOK_LIMITS.pageTitle)),
          body: blankAsNull(clip(text.body, NOTEBOOK_LIMITS.pageBody)),
          deleted: false,
        },
      },
    ]);
    return id;
  }

  /** Moves a page one place earlier or later: one write, unless the notebook needs renumbering. */
  async movePage(notebookId: string, pageId: string, by: -1 | 1): Promise<void> {
    const writes = this.positionWrites(movePage(await this.pagesOf(notebookId), pageId, by));
    if (writes.length) await this.store.writeAll(writes);
  }

  /** Deletes a notebook and its pages together (one write, so Trash restores them together). */
  removeNotebook(notebookId: string): Promise<void> {
    return this.deletions.remove('notebooks', notebookId);
  }

  /** Saves a page's text as a new template of the reader's own; returns its id. */
  saveTemplate(name: string, page: PageText): Promise<string> {
    return this.store.create('pageTemplates', {
      name: name.trim(),
      title: blankAsNull(clip(page.title.trim(), NOTEBOOK_LIMITS.templateTitle)),
      body: blankAsNull(clip(page.body, NOTEBOOK_LIMITS.templateBody)),
    });
  }

  renameTemplate(templateId: string, name: string): Promise<void> {
    return this.store.write('pageTemplates', templateId, { name: name.trim() });
  }

  private positionWrites(writes: readonly { id: string; position: number }[]): RowWrite[] {
    return writes.map(({ id, position }) => ({ collection: 'notebookPages', rowId: id, patch: { position } }));
  }
}

function blankAsNull(text: string): string | null {
  return text.trim() === '' ? null : text;
}
