import { describe, expect, it, vi } from 'vitest';
import { reviewPathFromArgv } from '../../main/argv';
import { createCloseGuard } from '../../main/closeGuard';
import type { CloseChoice } from '../../main/services/types';

describe('the review named on the command line', () => {
  it.each([
    [['electron', '.', '--open', '/r/demo.flankfilm.json'], '/r/demo.flankfilm.json'],
    [['electron', '.', '--open=rel/demo.flankfilm.json'], '/cwd/rel/demo.flankfilm.json'],
    [['Flankfilm', '/home/u/a.flankfilm.json'], '/home/u/a.flankfilm.json'],
    [['Flankfilm.exe', '--allow-file-access-from-files', 'C.flankfilm.json'], '/cwd/C.flankfilm.json'],
    [['Flankfilm', '--no-sandbox'], null],
    [['electron', '.'], null],
    [['electron', '.', '--open'], null],
    [['Flankfilm', 'notes.txt'], null],
  ])('%j → %s', (argv, expected) => {
    expect(reviewPathFromArgv(argv, '/cwd')).toBe(expected);
  });
});

describe('closing with unsaved changes', () => {
  function guard(choice: CloseChoice) {
    const deps = {
      confirmClose: vi.fn(async () => choice),
      requestSave: vi.fn(),
      close: vi.fn(),
      discardAutosave: vi.fn(async () => undefined),
    };
    const g = createCloseGuard(deps);
    const closeEvent = () => {
      const e = { preventDefault: vi.fn() };
      g.onClose(e);
      return e;
    };
    return { g, deps, closeEvent };
  }
  const settle = () => new Promise((ok) => setTimeout(ok, 0));

  it('a clean document closes without asking', () => {
    const { deps, closeEvent } = guard('cancel');
    expect(closeEvent().preventDefault).not.toHaveBeenCalled();
    expect(deps.confirmClose).not.toHaveBeenCalled();
  });

  it("Cancel keeps the window; Don't save closes and drops the autosave", async () => {
    const c = guard('cancel');
    c.g.setState({ title: 'HS pair', dirty: true });
    expect(c.closeEvent().preventDefault).toHaveBeenCalled();
    await settle();
    expect(c.deps.confirmClose).toHaveBeenCalledWith('HS pair');
    expect(c.deps.close).not.toHaveBeenCalled();

    const d = guard('discard');
    d.g.setState({ title: 'HS pair', dirty: true });
    d.closeEvent();
    await settle();
    expect(d.deps.discardAutosave).toHaveBeenCalled();
    expect(d.deps.close).toHaveBeenCalledOnce();
    expect(d.closeEvent().preventDefault).not.toHaveBeenCalled(); // the real close goes through
  });

  it('Save closes once the renderer reports the review saved, not before', async () => {
    const s = guard('save');
    s.g.setState({ title: 'HS pair', dirty: true });
    s.closeEvent();
    await settle();
    expect(s.deps.requestSave).toHaveBeenCalledOnce();
    expect(s.deps.close).not.toHaveBeenCalled();
    s.g.saveFinished(true);
    s.g.setState({ title: 'HS pair', dirty: false });
    expect(s.deps.close).toHaveBeenCalledOnce();
  });

  it('a canceled save drops the pending close', async () => {
    const s = guard('save');
    s.g.setState({ title: 'HS pair', dirty: true });
    s.closeEvent();
    await settle();
    s.g.saveFinished(false);
    s.g.setState({ title: 'HS pair', dirty: false }); // a later, ordinary save
    expect(s.deps.close).not.toHaveBeenCalled();
  });

  it('asks once, however often close is pressed', async () => {
    const c = guard('cancel');
    c.g.setState({ title: 'x', dirty: true });
    c.closeEvent();
    c.closeEvent();
    await settle();
    expect(c.deps.confirmClose).toHaveBeenCalledOnce();
  });
});
