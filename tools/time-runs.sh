#!/usr/bin/env bash
# Whole-process timing (not run by CI): tools/time-runs.sh N COMMAND... prints the median and least elapsed time and
# user+system CPU time of N runs, measured with /usr/bin/time.
n=$1; shift
for i in $(seq "$n"); do /usr/bin/time -f "%e %U %S" "$@" >/dev/null 2>>${TMPDIR:-/tmp}/rotordrive-time.$$ ; done
grep -E '^[0-9.]+ [0-9.]+ [0-9.]+$' ${TMPDIR:-/tmp}/rotordrive-time.$$ | awk '{print $1, $2+$3}' | sort -n > ${TMPDIR:-/tmp}/rotordrive-time.e.$$
awk '{print $2}' ${TMPDIR:-/tmp}/rotordrive-time.e.$$ | sort -n > ${TMPDIR:-/tmp}/rotordrive-time.c.$$
echo "elapsed median $(sed -n "$(( (n+1)/2 ))p" ${TMPDIR:-/tmp}/rotordrive-time.e.$$ | cut -d' ' -f1) s (min $(head -1 ${TMPDIR:-/tmp}/rotordrive-time.e.$$ | cut -d' ' -f1)), cpu median $(sed -n "$(( (n+1)/2 ))p" ${TMPDIR:-/tmp}/rotordrive-time.c.$$) s (min $(head -1 ${TMPDIR:-/tmp}/rotordrive-time.c.$$))"
rm -f ${TMPDIR:-/tmp}/rotordrive-time.$$ ${TMPDIR:-/tmp}/rotordrive-time.e.$$ ${TMPDIR:-/tmp}/rotordrive-time.c.$$
