import { NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';

import { POST_MAX_LENGTH, REACTIONS, type CirclePost, type Reaction } from '@shared/circles/circle-collections';
import { isPostShielded } from '@shared/circles/spoiler-shield';
import { deterministicId } from '@shared/sync/deterministic-id';

import { Auth } from '../../../core/auth/auth';
import { liveQueryFor } from '../../../core/data/live-query-for';
import { fieldError, notBlank } from '../../../ui/field-errors';
import { CircleStore } from '../data/circle-store';
import { CircleSync } from '../data/circle-sync';
import { PostForm } from './post-form';
import { PostTextPipe } from './post-text';
import { authorName, loadCircleView, type CircleView } from '../data/circle-view';

/** Our own reactions: an icon and the words a screen reader says. */
const REACTION_LOOKS: Readonly<Record<Reaction, { icon: string; label: string }>> = {
  lamp: { icon: 'lightbulb', label: 'This lit something up' },
  gasp: { icon: 'bolt', label: 'Gasp' },
  moved: { icon: 'water_drop', label: 'Moved me' },
  laugh: { icon: 'sentiment_very_satisfied', label: 'Made me laugh' },
  ponder: { icon: 'psychology_alt', label: 'Still thinking about it' },
};

type Post = CirclePost & { readonly _author?: string };

/** One part's discussion (or the general one): posts, replies and reactions, behind the spoiler shield. */
@Component({
  selector: 'll-part-discussion',
  imports: [NgTemplateOutlet, ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, PostForm, PostTextPipe],
  templateUrl: './part-discussion.html',
  styleUrl: './part-discussion.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PartDiscussion {
  readonly id = input.required<string>();
  readonly partId = input.required<string>();
  private readonly auth = inject(Auth);
  private readonly store = inject(CircleStore);
  protected readonly sync = inject(CircleSync);
  protected readonly fieldError = fieldError;
  protected readonly postMaxLength = POST_MAX_LENGTH;
  protected readonly reactions = REACTIONS;
  protected readonly looks = REACTION_LOOKS;

  protected readonly myId = computed(() => this.auth.user()?.id ?? '');
  private readonly key = computed(() => this.id());
  protected readonly view = liveQueryFor(this.key, (db, id) => loadCircleView(db, id, this.myId()));
  protected readonly general = computed(() => this.partId() === 'general');
  protected readonly part = computed(() => this.view()?.parts.find((part) => part.id === this.partId()));
  protected readonly isHost = computed(() => this.view()?.meta?.role === 'host');
  protected readonly replyingTo = signal<string | null>(null);
  protected readonly editing = signal<string | null>(null);

  protected readonly form = inject(FormBuilder).nonNullable.group({ text: ['', [notBlank]] });
  protected readonly replyForm = inject(FormBuilder).nonNullable.group({ text: ['', [notBlank]] });
  protected readonly editForm = inject(FormBuilder).nonNullable.group({ text: ['', [notBlank]] });

  constructor() {
    queueMicrotask(() => void this.sync.syncCircle(this.id()));
  }

  /** Top-level posts of this discussion, each with its replies. */
  protected readonly threads = computed(() => {
    const view = this.view();
    if (!view) return [];
    const partId = this.general() ? null : this.partId();
    const posts = view.posts.filter((post) => (post.partId ?? null) === partId);
    return posts.filter((post) => !post.replyToId).map((post) => ({ post, replies: posts.filter((reply) => reply.replyToId === post.id) }));
  });

  protected shielded(view: CircleView, post: Post): boolean {
    const part = this.part();
    const context = part?.pickId ? view.shield.get(part.pickId) : undefined;
    if (!context) return false;
    return isPostShielded({ partId: post.partId, mine: post._author === this.myId() }, context, context.passed);
  }

  protected passed(view: CircleView): boolean {
    const part = this.part();
    return !!part?.pickId && !!view.shield.get(part.pickId)?.passed.has(part.id);
  }

  protected author(view: CircleView, post: Post): string {
    return authorName(view, post._author, this.myId());
  }

  protected count(view: CircleView, postId: string, kind: Reaction): number {
    return view.reactions.filter((reaction) => reaction.postId === postId && reaction.kind === kind).length;
  }

  protected mine(view: CircleView, postId: string, kind: Reaction): boolean {
    return view.reactions.some((reaction) => reaction.postId === postId && reaction.kind === kind && reaction._author === this.myId());
  }

  protected react(view: CircleView, postId: string, kind: Reaction): Promise<void> {
    // One row per reader, post and kind: the same on every device, toggled by `on`.
    const rowId = deterministicId('circle-reaction', `${postId}:${this.myId()}:${kind}`);
    return this.store.write('circleReactions', rowId, this.id(), { postId, kind, on: !this.mine(view, postId, kind), deleted: false });
  }

  protected async post(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    await this.write(this.form.getRawValue().text, null);
    this.form.reset();
  }

  protected async reply(postId: string): Promise<void> {
    if (this.replyForm.invalid) return this.replyForm.markAllAsTouched();
    await this.write(this.replyForm.getRawValue().text, postId);
    this.replyForm.reset();
    this.replyingTo.set(null);
  }

  private async write(text: string, replyToId: string | null): Promise<void> {
    await this.store.create('circlePosts', this.id(), {
      partId: this.general() ? null : this.partId(),
      replyToId,
      text: text.trim(),
      postedAt: new Date().toISOString(),
    });
  }

  protected reveal(view: CircleView): Promise<void> {
    const revealedPartIds = [...new Set([...(view.mine?.revealedPartIds ?? []), this.partId()])];
    return this.store.write('circleProgress', view.myProgressId, this.id(), { revealedPartIds });
  }

  protected markPast(view: CircleView): Promise<void> {
    const pastPartIds = [...new Set([...(view.mine?.pastPartIds ?? []), this.partId()])];
    const shared = view.mine?.shareProgress ? { sharedPastPartIds: [...new Set([...(view.mine.sharedPastPartIds ?? []), this.partId()])] } : {};
    return this.store.write('circleProgress', view.myProgressId, this.id(), { pastPartIds, ...shared });
  }

  protected startEdit(post: Post): void {
    this.editForm.reset({ text: post.text ?? '' });
    this.editing.set(post.id);
  }

  /** Only the author edits a post's text (the server refuses anyone else's edit). */
  protected async saveEdit(post: Post): Promise<void> {
    if (this.editForm.invalid) return this.editForm.markAllAsTouched();
    await this.store.write('circlePosts', post.id, this.id(), { text: this.editForm.getRawValue().text.trim(), editedAt: new Date().toISOString() });
    this.editing.set(null);
  }

  protected hide(post: Post, hidden: boolean): Promise<void> {
    return this.store.write('circlePosts', post.id, this.id(), { hidden });
  }

  protected remove(post: Post): Promise<void> {
    return this.store.write('circlePosts', post.id, this.id(), { deleted: true });
  }
}
