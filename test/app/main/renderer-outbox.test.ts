import { describe, expect, it } from 'vitest';
import { RendererOutbox, type OutboxMessage } from '../../../app/main/renderer-outbox.ts';

const file = { name: 'a.hingeline', path: '/a.hingeline', text: '{}' };

describe('RendererOutbox', () => {
  it('holds messages until the renderer listens to their topic, then delivers them in order', () => {
    const delivered: OutboxMessage[] = [];
    const outbox = new RendererOutbox((message) => delivered.push(message));
    outbox.post({ topic: 'open-file', payload: file });
    outbox.post({ topic: 'menu-command', payload: 'open-demo' });
    outbox.post({ topic: 'menu-command', payload: 'analyze' });
    expect(delivered).toEqual([]);

    outbox.markListening('menu-command');
    expect(delivered.map((message) => message.payload)).toEqual(['open-demo', 'analyze']);
    outbox.markListening('open-file');
    expect(delivered.at(-1)).toEqual({ topic: 'open-file', payload: file });
    expect(outbox.pendingCount).toBe(0);
  });

  it('delivers at once while listening, and queues again after a reload (reset)', () => {
    const delivered: OutboxMessage[] = [];
    const outbox = new RendererOutbox((message) => delivered.push(message));
    outbox.markListening('menu-command');
    outbox.post({ topic: 'menu-command', payload: 'save' });
    expect(delivered).toHaveLength(1);
    outbox.reset();
    outbox.post({ topic: 'menu-command', payload: 'undo' });
    expect(delivered).toHaveLength(1);
    expect(outbox.pendingCount).toBe(1);
  });

  it('keeps at most 20 waiting messages, dropping the oldest', () => {
    const delivered: OutboxMessage[] = [];
    const outbox = new RendererOutbox((message) => delivered.push(message));
    for (let index = 0; index < 25; index += 1) outbox.post({ topic: 'menu-command', payload: index % 2 === 0 ? 'undo' : 'redo' });
    expect(outbox.pendingCount).toBe(20);
    outbox.markListening('menu-command');
    expect(delivered).toHaveLength(20);
    expect(delivered[0]?.payload).toBe('redo'); // messages 0–4 were dropped; #5 is a redo
  });
});
