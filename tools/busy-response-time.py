#!/usr/bin/env python3
# Not run by CI. How the workbench answers while a long run goes (issue 15 item 1), in a pseudo-terminal (120 x 40, or RD_SIZE=80x24):
#   tools/busy-response-time.py ROTORDRIVE ui RIG.json
# opens the Stress sheet (Alt+9), sets 50,000 samples and starts the run (F5), then while it runs switches sheets
# (Alt+5, Alt+1, Alt+3, Alt+9, five rounds) and times each switch from the key to the first screen output that shows the
# sheet's title in the frame ("switch"), and to the first output that shows text of the sheet's own content, which on a
# first visit may wait for the sheet's computation ("content"); finally presses F8 on the Stress sheet and times it to
# the 'PARTIAL' result. In between it types into a Rig field during the run and times each key to its echo. Elapsed wall-clock times; the machine's load counts, so quote them with the load average.

import os, pty, re, sys, time, select, fcntl, termios, struct

exe = sys.argv[1:]
# RD_SIZE=80x24 for the smallest terminal the sheets are laid out for (content needles below the fold then show 'inf').
COLS, ROWS = (int(v) for v in os.environ.get('RD_SIZE', '120x40').split('x'))
# RD_LOAD=rank runs a full ranking instead of the stress run. The demo catalogs rank in half a second, so the rig is
# copied with its catalogs to a temporary folder and every motor row gets 200 invented Kv variants (Kv x f, resistance
# / f^2, no-load current x sqrt f, current x f: the same copper wound for another Kv; generated here, never committed).
LOAD = os.environ.get('RD_LOAD', 'stress')


def big_catalog(rig):
    import csv, io, shutil, tempfile
    src = os.path.dirname(os.path.abspath(rig)); dst = tempfile.mkdtemp(prefix='rd-rank-')
    for name in os.listdir(src):
        if os.path.isfile(os.path.join(src, name)):
            shutil.copy(os.path.join(src, name), dst)
    rows = list(csv.DictReader(open(os.path.join(src, 'motors.csv'))))
    out = io.StringIO(); w = csv.DictWriter(out, fieldnames=list(rows[0].keys()), lineterminator='\n'); w.writeheader()
    for r in rows:
        w.writerow(r)
        for k in range(200):
            f = 0.8 + 0.4 * k / 199.0; v = dict(r); v['id'] = '%s-v%03d' % (r['id'], k)
            v['kv_rpm_per_v'] = '%.4g' % (float(r['kv_rpm_per_v']) * f)
            v['resistance_ohm'] = '%.4g' % (float(r['resistance_ohm']) / f ** 2)
            v['no_load_current_a'] = '%.4g' % (float(r['no_load_current_a']) * f ** 0.5)
            v['max_current_a'] = '%.4g' % (float(r['max_current_a']) * f)
            w.writerow(v)
    open(os.path.join(dst, 'motors.csv'), 'w').write(out.getvalue())
    return os.path.join(dst, os.path.basename(rig))


if LOAD == 'rank':
    exe[-1] = big_catalog(exe[-1])


def start():
    pid, fd = pty.fork()
    if pid == 0:
        os.environ['TERM'] = 'xterm-256color'
        os.environ['COLUMNS'] = str(COLS); os.environ['LINES'] = str(ROWS)
        os.execvp(exe[0], exe)
    fcntl.ioctl(fd, termios.TIOCSWINSZ, struct.pack('HHHH', ROWS, COLS, 0, 0))
    return pid, fd


def wait_for(fd, needles, timeout=30.0):
    """Reads until the output has matched each pattern (bytes regexes); returns the seconds each took (None if not seen)."""
    t0 = time.monotonic(); buf = b''; seen = [None] * len(needles)
    while time.monotonic() - t0 < timeout and None in seen:
        r, _, _ = select.select([fd], [], [], 0.005)
        if r:
            data = os.read(fd, 65536)
            if b'\x1b[6n' in data: os.write(fd, b'\x1b[1;1R')
            if b'\x1b[c' in data or b'\x1b[0c' in data: os.write(fd, b'\x1b[?62;c')
            buf += data
            for i, n in enumerate(needles):
                if seen[i] is None and re.search(n, buf):
                    seen[i] = time.monotonic() - t0
    return seen


def drain(fd, seconds):
    end = time.monotonic() + seconds
    while time.monotonic() < end:
        if select.select([fd], [], [], 0.01)[0]:
            os.read(fd, 65536)


def title(name):
    # The sheet's name in the frame's top border, '┤' + colour codes + name + (colour reset or '├'); the sheet list on the
    # left shows every name too, but as '5 Hover & yaw', never after '┤'.
    return b'\xe2\x94\xa4(?:\x1b\\[[0-9;]*m)*' + re.escape(name) + b'(?:\x1b|\xe2\x94\x9c)'


pid, fd = start()
wait_for(fd, [re.escape(b'F10 Quit')], 60)
drain(fd, 0.5)
if LOAD == 'rank':
    # The Shortlist ranks the catalogs on arrival.
    os.write(fd, b'\x1b8')
    print('run started: %s' % ('yes' if wait_for(fd, [re.escape(b'Ranking')])[0] is not None else 'no'))
    run_key, run_name, run_text, stopped = b'8', b'Shortlist', b'rank by', b'Stopped before the ranking finished'
else:
    os.write(fd, b'\x1b9'); wait_for(fd, [re.escape(b'Tolerances')]); drain(fd, 0.5)
    # The samples field has the focus on arrival: 50,000 samples, as the load (2,000 end within seconds).
    os.write(fd, b'\x1b[F' + b'\x7f' * 8 + b'50000'); drain(fd, 0.5)
    os.write(fd, b'\x1b[15~')  # F5: run
    print('run started: %s' % ('yes' if wait_for(fd, [re.escape(b'Running')])[0] is not None else 'no'))
    run_key, run_name, run_text, stopped = b'9', b'Stress', b'Tolerances (first six', b'PARTIAL'
drain(fd, 1.0)
switch, content, order = [], [], []
for _ in range(5):
    # Each content needle is text of the sheet itself, never of the sheet list on the left.
    for key, name, text in ((b'5', b'Hover & yaw', b'over = the limit'), (b'1', b'Rig', b'CG forward x'),
                            (b'3', b'Lift & drag', b'drag peak'), (run_key, run_name, run_text)):
        os.write(fd, b'\x1b' + key)
        s, c = wait_for(fd, [title(name), re.escape(text)], 10)
        switch.append(s if s is not None else float('inf'))
        content.append(c if c is not None else float('inf'))
        order.append('Alt+%s %.3f/%.3f' % (key.decode(), switch[-1], content[-1]))
        drain(fd, 0.2)
for label, times in (('switch (frame title)', switch), ('content', content)):
    t = sorted(times)
    print('%s: %d, median %.3f s, max %.3f s' % (label, len(t), t[len(t) // 2], t[-1]))
print('in order, switch/content (s): ' + ', '.join(order))
# Typing during the run: on the Rig sheet the first field (the plate material's id, al-1350) has the focus; a '7' typed at its end
# makes the id unknown (the field's text shows it), Backspace puts it back (the totals line returns).
os.write(fd, b'\x1b1'); wait_for(fd, [title(b'Rig')]); drain(fd, 0.3)
os.write(fd, b'\x1b[F'); drain(fd, 0.3)
typed = []
for _ in range(5):
    os.write(fd, b'7')
    typed.append(wait_for(fd, [re.escape(b'al-13507')], 10)[0] or float('inf'))
    drain(fd, 0.3)
    os.write(fd, b'\x7f')
    typed.append(wait_for(fd, [rb'Mass \d'], 10)[0] or float('inf'))
    drain(fd, 0.3)
t = sorted(typed)
print('typing (key to echo): %d, median %.3f s, max %.3f s' % (len(t), t[len(t) // 2], t[-1]))
os.write(fd, b'\x1b' + run_key); wait_for(fd, [title(run_name)]); drain(fd, 0.3)
os.write(fd, b'\x1b[19~')  # F8: stop
t = wait_for(fd, [re.escape(stopped)], 10)[0]
print('F8 to the %s result: %s' % (LOAD, '%.3f s' % t if t is not None else 'not seen in 10 s (the run may have finished)'))
os.write(fd, b'\x1b[21~')
time.sleep(0.3)
try: os.kill(pid, 9)
except OSError: pass
os.waitpid(pid, 0)
print('load average: %s' % open('/proc/loadavg').read().split()[:3])
