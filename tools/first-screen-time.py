#!/usr/bin/env python3
# Not run by CI. tools/first-screen-time.py ROTORDRIVE ui RIG.json: runs the workbench in a pseudo-terminal (120 x 40) and
# prints the time from process start to its first full screen (the key bar drawn), elapsed and CPU (user+system).

import os, pty, sys, time, select, re
exe = sys.argv[1:]
cpu_first = None
def run(keys=None, want2=None):
    t0 = time.monotonic()
    pid, fd = pty.fork()
    if pid == 0:
        os.environ['TERM'] = 'xterm-256color'
        os.environ['COLUMNS'] = '120'; os.environ['LINES'] = '40'
        os.execvp(exe[0], exe)
    import fcntl, termios, struct
    fcntl.ioctl(fd, termios.TIOCSWINSZ, struct.pack('HHHH', 40, 120, 0, 0))
    buf = b''; t_first = None; t_second = None
    deadline = t0 + 60
    while time.monotonic() < deadline:
        r, _, _ = select.select([fd], [], [], 0.01)
        if r:
            try:
                data = os.read(fd, 65536)
            except OSError:
                break
            buf += data
            # answer terminal queries (cursor position / device attributes) so the driver does not wait
            if b'\x1b[6n' in data: os.write(fd, b'\x1b[1;1R')
            if b'\x1b[c' in data or b'\x1b[0c' in data: os.write(fd, b'\x1b[?62;c')
            if t_first is None and b'F10 Quit' in buf:
                t_first = time.monotonic() - t0
                f = open('/proc/%d/stat' % pid).read().rsplit(')', 1)[1].split()
                global cpu_first
                cpu_first = (int(f[11]) + int(f[12])) / os.sysconf('SC_CLK_TCK')
                if keys: os.write(fd, keys); buf = b''
                else: break
            elif t_first is not None and want2 and want2 in buf:
                t_second = time.monotonic() - t0
                break
    os.write(fd, b'\x1b[21~')  # F10
    time.sleep(0.3)
    try: os.kill(pid, 9)
    except OSError: pass
    os.waitpid(pid, 0)
    return t_first, t_second
mode = os.environ.get('MODE', 'first')
if mode == 'first':
    cpu_first = None
    print('first screen %.3f s elapsed, %.2f s CPU' % (run()[0], cpu_first))
