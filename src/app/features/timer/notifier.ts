import { InjectionToken } from '@angular/core';

/** Whether this browser may show our notifications, or cannot show any. */
export type NotifyPermission = NotificationPermission | 'unsupported';

/** The little of the Notifications API the timer uses. Specs provide a fake. */
export interface Notifier {
  permission(): NotifyPermission;
  /** Asks the reader; call only from something they did (turning the option on). */
  requestPermission(): Promise<NotifyPermission>;
  show(title: string, body: string): Promise<void>;
}

/** One tag, so several tabs telling the same news replace each other instead of piling up. */
const TAG = 'lamplight-reading-timer';

function browserNotifier(): Notifier {
  const supported = () => typeof Notification !== 'undefined';
  return {
    permission: () => (supported() ? Notification.permission : 'unsupported'),
    requestPermission: async () => (supported() ? Notification.requestPermission() : 'unsupported'),
    async show(title, body) {
      if (!supported() || Notification.permission !== 'granted') return;
      // Android shows notifications only through the service worker; `new Notification` throws there.
      const registration = await globalThis.navigator?.serviceWorker?.getRegistration().catch(() => undefined);
      if (registration) await registration.showNotification(title, { body, tag: TAG, icon: 'icons/icon-192.png' });
      else new Notification(title, { body, tag: TAG });
    },
  };
}

/** This browser's notifications. */
export const NOTIFIER = new InjectionToken<Notifier>('NOTIFIER', { providedIn: 'root', factory: browserNotifier });
