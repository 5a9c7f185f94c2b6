#!/usr/bin/env python3
# Not run by CI. Whole-process timing of the workbench in a pseudo-terminal (120 x 40):
#   tools/first-screen-time.py ROTORDRIVE ui RIG.json
#       the time from process start to its first full screen (the key bar drawn), elapsed and CPU (user+system);
#   MODE=visit tools/first-screen-time.py ROTORDRIVE ui RIG.json
#       for each sheet key 1..9, 0 in a fresh process: the time from pressing Alt+key on the first screen until the
#       screen stops changing (no output beyond the driver's idle cursor writes for QUIET seconds, default 0.25, not
#       counted), i.e. the first visit's cost including the sheet's own computation.

import os, pty, sys, time, select

exe = sys.argv[1:]
QUIET = float(os.environ.get('QUIET', '0.25'))


def cpu_of(pid):
    f = open('/proc/%d/stat' % pid).read().rsplit(')', 1)[1].split()
    return (int(f[11]) + int(f[12])) / os.sysconf('SC_CLK_TCK')


def run(keys=None):
    """Starts the workbench; returns (first screen s, its CPU s, visit s or None)."""
    t0 = time.monotonic()
    pid, fd = pty.fork()
    if pid == 0:
        os.environ['TERM'] = 'xterm-256color'
        os.environ['COLUMNS'] = '120'; os.environ['LINES'] = '40'
        os.execvp(exe[0], exe)
    import fcntl, termios, struct
    fcntl.ioctl(fd, termios.TIOCSWINSZ, struct.pack('HHHH', 40, 120, 0, 0))
    buf = b''; t_first = None; cpu_first = None; t_key = None; t_last = None
    deadline = t0 + 60
    while time.monotonic() < deadline:
        r, _, _ = select.select([fd], [], [], 0.01)
        now = time.monotonic()
        if r:
            try:
                data = os.read(fd, 65536)
            except OSError:
                break
            buf += data
            # answer terminal queries (cursor position / device attributes) so the driver does not wait
            if b'\x1b[6n' in data: os.write(fd, b'\x1b[1;1R')
            if b'\x1b[c' in data or b'\x1b[0c' in data: os.write(fd, b'\x1b[?62;c')
            if t_key is not None and len(data) > 16:   # the driver's idle cursor writes are 6 bytes each
                t_last = now
            if t_first is None and b'F10 Quit' in buf:
                t_first = now - t0
                cpu_first = cpu_of(pid)
                if not keys:
                    break
                time.sleep(0.5)   # let the first screen settle before the key
                while select.select([fd], [], [], 0)[0]:
                    os.read(fd, 65536)
                os.write(fd, keys); t_key = time.monotonic(); t_last = t_key
        elif t_key is not None and now - t_last >= QUIET:
            break
    os.write(fd, b'\x1b[21~')  # F10
    time.sleep(0.3)
    try: os.kill(pid, 9)
    except OSError: pass
    os.waitpid(pid, 0)
    return t_first, cpu_first, (t_last - t_key) if t_key is not None else None


mode = os.environ.get('MODE', 'first')
if mode == 'first':
    first, cpu, _ = run()
    print('first screen %.3f s elapsed, %.2f s CPU' % (first, cpu))
else:
    for key in '1234567890':
        _, _, visit = run(b'\x1b' + key.encode())
        print('sheet key %s: first visit %.3f s' % (key, visit))
