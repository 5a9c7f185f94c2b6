#!/usr/bin/env python3
# Not run by CI. How the workbench answers while a long run goes (issue 15 item 1), in a pseudo-terminal (120 x 40):
#   tools/busy-response-time.py ROTORDRIVE ui RIG.json
# opens the Stress sheet (Alt+9), starts its run (F5), then while it runs switches sheets (Alt+5, Alt+1, Alt+3,
# Alt+9, five rounds) and times each switch from the key to the first screen output that shows the sheet; finally
# presses F8 on the Stress sheet and times it to the 'PARTIAL' result. Elapsed wall-clock times; the machine's load
# counts, so quote them with the load average.

import os, pty, sys, time, select, fcntl, termios, struct

exe = sys.argv[1:]


def start():
    pid, fd = pty.fork()
    if pid == 0:
        os.environ['TERM'] = 'xterm-256color'
        os.environ['COLUMNS'] = '120'; os.environ['LINES'] = '40'
        os.execvp(exe[0], exe)
    fcntl.ioctl(fd, termios.TIOCSWINSZ, struct.pack('HHHH', 40, 120, 0, 0))
    return pid, fd


def wait_for(fd, needle, timeout=30.0):
    """Reads until the output holds needle; returns the seconds it took, or None."""
    t0 = time.monotonic(); buf = b''
    while time.monotonic() - t0 < timeout:
        r, _, _ = select.select([fd], [], [], 0.005)
        if r:
            data = os.read(fd, 65536)
            if b'\x1b[6n' in data: os.write(fd, b'\x1b[1;1R')
            if b'\x1b[c' in data or b'\x1b[0c' in data: os.write(fd, b'\x1b[?62;c')
            buf += data
            if needle in buf:
                return time.monotonic() - t0
    return None


def drain(fd, seconds):
    end = time.monotonic() + seconds
    while time.monotonic() < end:
        if select.select([fd], [], [], 0.01)[0]:
            os.read(fd, 65536)


pid, fd = start()
wait_for(fd, b'F10 Quit', 60)
drain(fd, 0.5)
os.write(fd, b'\x1b9'); wait_for(fd, b'Tolerances'); drain(fd, 0.5)
os.write(fd, b'\x1b[15~')  # F5: run
print('run started: %s' % ('yes' if wait_for(fd, b'Running') is not None else 'no'))
drain(fd, 1.0)
times = []
for _ in range(5):
    # Each needle is text of the sheet itself, never of the sheet list on the left: the list shows every sheet's name,
    # and a redraw of the whole window (four a second before 12-03) printed those names without any switch.
    for key, title in ((b'5', b'over = the limit'), (b'1', b'CG forward x'), (b'3', b'drag peak'), (b'9', b'Tolerances (first six')):
        os.write(fd, b'\x1b' + key)
        t = wait_for(fd, title, 10)
        times.append(t if t is not None else float('inf'))
        drain(fd, 0.2)
times.sort()
print('sheet switches during the run: %d, median %.3f s, max %.3f s' % (len(times), times[len(times) // 2], times[-1]))
os.write(fd, b'\x1b[19~')  # F8: stop
t = wait_for(fd, b'PARTIAL', 10)
print('F8 to the partial result: %s' % ('%.3f s' % t if t is not None else 'not seen in 10 s (the run may have finished)'))
os.write(fd, b'\x1b[21~')
time.sleep(0.3)
try: os.kill(pid, 9)
except OSError: pass
os.waitpid(pid, 0)
print('load average: %s' % open('/proc/loadavg').read().split()[:3])
