import { Pipe, type PipeTransform } from '@angular/core';

import { renderPostText } from '@shared/circles/post-format';

/** A post's light formatting as HTML (markdown-it, HTML off, only http(s) and mailto links); bound with [innerHTML], which Angular sanitises again. */
@Pipe({ name: 'postText' })
export class PostTextPipe implements PipeTransform {
  transform(text: string | null | undefined): string {
    return renderPostText(text ?? '');
  }
}
