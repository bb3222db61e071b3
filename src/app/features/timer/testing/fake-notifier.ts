import type { Notifier, NotifyPermission } from '../notifier';

/** Notifications for specs: the permission is whatever the spec says, and shown ones are kept. */
export class FakeNotifier implements Notifier {
  readonly shown: { title: string; body: string }[] = [];
  asked = 0;

  constructor(
    /** What the browser allows now. */
    public current: NotifyPermission = 'default',
    private answer: NotifyPermission = 'granted',
  ) {}

  permission(): NotifyPermission {
    return this.current;
  }

  async requestPermission(): Promise<NotifyPermission> {
    this.asked++;
    this.current = this.answer;
    return this.current;
  }

  async show(title: string, body: string): Promise<void> {
    this.shown.push({ title, body });
  }
}
