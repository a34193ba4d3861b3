#!/usr/bin/env python3
"""Times the tool's dense LU path against numpy.linalg.solve on the same exported band system.

For each size, runs `SolverBenchmark dense N FILE THREADS` (which writes one band system
A = I - diag(rho) F, b of the invented closed box and times the tool's factorization and solve),
then loads FILE and times numpy.linalg.solve (LAPACK gesv through OpenBLAS) on one thread, in the
same run. Not a test; results go to docs/performance.md.

The tool runs with its vector kernel (the JDK's incubating vector API, added with
--add-modules as the launcher does) and, with --scalar, also without it.

usage: dense_vs_numpy.py CLASSPATH N [N ...] [--java-threads 1,2] [--heap 8g] [--scalar]
"""
import os
import sys

os.environ.setdefault("OPENBLAS_NUM_THREADS", "1")
os.environ.setdefault("OMP_NUM_THREADS", "1")
os.environ.setdefault("MKL_NUM_THREADS", "1")

import re  # noqa: E402
import statistics  # noqa: E402
import subprocess  # noqa: E402
import tempfile  # noqa: E402
import time  # noqa: E402

import numpy as np  # noqa: E402


def java_dense(cp, n, path, threads, heap, vector=True):
    kernel = ["--add-modules", "jdk.incubator.vector"] if vector else ["-Dexitance.vector=false"]
    out = subprocess.run(["java", "-Xmx" + heap] + kernel + ["-cp", cp, "org.exitance.bench.SolverBenchmark", "dense",
                          str(n), path, str(threads)], check=True, capture_output=True, text=True).stdout
    m = re.search(r"N=(\d+) threads=(\d+) median_s=([\d.]+) min_s=([\d.]+) runs=(.*) residual=(\S+)", out)
    if not m:
        raise SystemExit("unexpected output: " + out)
    return int(m.group(1)), float(m.group(3)), float(m.group(4)), float(m.group(6))


def numpy_solve(path, runs=3):
    raw = np.fromfile(path, dtype="<f8")
    n = int(raw[0])
    a = raw[1:1 + n * n].reshape(n, n)
    b = raw[1 + n * n:1 + n * n + n]
    times = []
    x = None
    for _ in range(runs):
        t0 = time.perf_counter()
        x = np.linalg.solve(a, b)
        times.append(time.perf_counter() - t0)
    residual = np.max(np.abs(b - a @ x)) / np.max(np.abs(b))
    return n, statistics.median(times), min(times), residual


def main(argv):
    if len(argv) < 3:
        print(__doc__)
        return 2
    cp = argv[1]
    sizes = []
    threads = [1, 2]
    heap = "8g"
    scalar = False
    i = 2
    while i < len(argv):
        if argv[i] == "--java-threads":
            threads = [int(t) for t in argv[i + 1].split(",")]
            i += 2
        elif argv[i] == "--scalar":
            scalar = True
            i += 1
        elif argv[i] == "--heap":
            heap = argv[i + 1]
            i += 2
        else:
            sizes.append(int(argv[i]))
            i += 1
    runs = [(t, True) for t in threads] + ([(t, False) for t in threads] if scalar else [])
    print("N       numpy_1t_s  " + "  ".join("%s_%dt_s  ratio" % ("vec" if v else "scal", t) for t, v in runs)
          + "  residual numpy / java")
    with tempfile.TemporaryDirectory() as d:
        for size in sizes:
            path = os.path.join(d, "band.bin")
            java = [java_dense(cp, size, path, t, heap, v) for t, v in runs]
            n, np_med, np_min, np_res = numpy_solve(path)
            cols = "  ".join("%-10.3f %-6.2f" % (j[1], j[1] / np_med) for j in java)
            print("%-7d %-11.3f %s  %.1e / %.1e" % (n, np_med, cols, np_res, java[0][3]))
            os.remove(path)
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
