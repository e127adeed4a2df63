/**
 * Messages main pushes to the renderer (menu commands, files to open) are held until the
 * renderer has subscribed to them; otherwise a file passed on the command line would arrive
 * before the page listens and be lost. Pure, no Electron import.
 */
import type { OpenedFilePayload } from '../shared/bridge.ts';
import type { ListeningTopic } from '../shared/ipc-channels.ts';
import type { MenuCommand } from '../shared/menu-commands.ts';

export type OutboxMessage =
  | { readonly topic: 'menu-command'; readonly payload: MenuCommand }
  | { readonly topic: 'open-file'; readonly payload: OpenedFilePayload };

export class RendererOutbox {
  private readonly listening = new Set<ListeningTopic>();
  private readonly pending: OutboxMessage[] = [];

  constructor(private readonly deliver: (message: OutboxMessage) => void) {}

  /** Delivers now if the renderer listens to the topic, else queues (at most 20 messages). */
  post(message: OutboxMessage): void {
    if (this.listening.has(message.topic)) {
      this.deliver(message);
      return;
    }
    this.pending.push(message);
    if (this.pending.length > 20) this.pending.shift();
  }

  /** The renderer subscribed to `topic`: deliver what waited for it, in order. */
  markListening(topic: ListeningTopic): void {
    this.listening.add(topic);
    const ready = this.pending.filter((message) => message.topic === topic);
    for (const message of ready) this.pending.splice(this.pending.indexOf(message), 1);
    for (const message of ready) this.deliver(message);
  }

  /** The page is (re)loading: nothing listens until it subscribes again. */
  reset(): void {
    this.listening.clear();
  }

  get pendingCount(): number {
    return this.pending.length;
  }
}
