import { describe, expect, it } from 'vitest';
import { AutosaveThrottle } from '../../../app/main/autosave-throttle.ts';

/** A clock and a timer queue the test advances by hand. */
function manualTime() {
  let now = 0;
  const timers: { at: number; run: () => void }[] = [];
  return {
    now: () => now,
    schedule: (run: () => void, delayMs: number) => void timers.push({ at: now + delayMs, run }),
    async advance(ms: number) {
      now += ms;
      for (;;) {
        const due = timers.filter((t) => t.at <= now).sort((a, b) => a.at - b.at)[0];
        if (!due) break;
        timers.splice(timers.indexOf(due), 1);
        due.run();
        await new Promise((resolve) => setTimeout(resolve, 0));
      }
    },
  };
}

const settle = () => new Promise((resolve) => setTimeout(resolve, 0));

describe('autosave rate limit', () => {
  it('writes at once, then merges calls within the interval into one write of the latest text', async () => {
    const time = manualTime();
    const written: string[] = [];
    const throttle = new AutosaveThrottle(async (text) => void written.push(text), { minIntervalMs: 2000, now: time.now, schedule: time.schedule });
    const first = throttle.submit('v1');
    await settle();
    expect(written).toEqual(['v1']);
    await first;
    const calls = Array.from({ length: 500 }, (_, i) => throttle.submit(`v${i + 2}`));
    await settle();
    expect(written).toEqual(['v1']);
    await time.advance(1999);
    expect(written).toEqual(['v1']);
    await time.advance(1);
    await Promise.all(calls);
    // 500 calls in the interval: one write, of the last text.
    expect(written).toEqual(['v1', 'v501']);
  });

  it('never writes more often than once per interval, however fast the calls come', async () => {
    const time = manualTime();
    const starts: number[] = [];
    const throttle = new AutosaveThrottle(async () => void starts.push(time.now()), { minIntervalMs: 2000, now: time.now, schedule: time.schedule });
    for (let t = 0; t < 20_000; t += 100) {
      void throttle.submit(`text at ${t}`);
      await time.advance(100);
    }
    for (let i = 1; i < starts.length; i++) expect(starts[i]! - starts[i - 1]!).toBeGreaterThanOrEqual(2000);
    expect(starts.length).toBeLessThanOrEqual(11);
  });

  it('does not write the same text twice, and passes a failed write on to its callers', async () => {
    const time = manualTime();
    let fail = false;
    const written: string[] = [];
    const throttle = new AutosaveThrottle(async (text) => {
      if (fail) throw new Error('disk full');
      written.push(text);
    }, { minIntervalMs: 10, now: time.now, schedule: time.schedule });
    await throttle.submit('same');
    await time.advance(10);
    await throttle.submit('same');
    expect(written).toEqual(['same']);
    throttle.reset();
    await time.advance(10);
    await throttle.submit('same');
    expect(written).toEqual(['same', 'same']);
    fail = true;
    await time.advance(10);
    await expect(throttle.submit('other')).rejects.toThrow('disk full');
  });
});
