"""Times a warm POST /v1/spectrum against a vectorised NumPy/SciPy evaluation of the same ln Z, U, S
and C_V on the same data, in one run, and then sends one large job through the API.

Usage: python3 bench/spectrum_vs_numpy.py BASE_URL [SERVICE_PID]
(bench/http.sh starts the service and calls this with its process id)

The data: levels with E / k_B uniform in [0, 20 000) K in random order, integer degeneracies 1 to
25, and temperatures evenly from 100 K to 3000 K (as in the JMH benchmark), energies given in K so that both
sides work in the same reduced units. The statesum time is end to end as a client sees it: encoding
is done once beforehand (a client holds its body), then each timed repeat sends the body over HTTP,
the service parses, validates, computes with error bounds and writes its JSON answer, and the client
reads and decodes that answer. The three timings are interleaved (one call of each per round, 11
rounds after 3 warm-ups, medians), so that the load of a shared machine weighs on all alike. The
NumPy time starts from arrays already in memory (no JSON at all), which favours NumPy; its time
including decoding the same request body is printed beside it.

Given the service's process id, the CPU time each side spends is reported too (the service's from
/proc/PID/stat, all its threads, plus this client's own for the request; NumPy's from
time.process_time), since on a shared machine wall times carry the load of other processes.
"""
import os
import json
import statistics
import sys
import time
import urllib.request

import numpy as np
from scipy.special import logsumexp

WARMUP = 3
REPEATS = 11
TICKS = os.sysconf("SC_CLK_TCK")


def dataset(levels, temperatures, seed):
    rng = np.random.default_rng(seed)
    energies = 20_000.0 * rng.random(levels)
    degeneracies = rng.integers(1, 26, levels).astype(np.float64)
    grid = np.linspace(100.0, 3000.0, temperatures)
    return energies, degeneracies, grid


def request_body(energies, degeneracies, grid):
    return json.dumps({
        "levels": {"energies": energies.tolist(), "degeneracies": degeneracies.tolist()},
        "energyUnit": "K",
        "temperatures": {"values": grid.tolist()},
    }).encode()


def post(base, body, timeout=600):
    request = urllib.request.Request(base + "/v1/spectrum", data=body,
                                     headers={"Content-Type": "application/json"})
    with urllib.request.urlopen(request, timeout=timeout) as response:
        return json.loads(response.read())


def service_cpu_seconds(pid):
    """User plus system CPU time of a process, all threads, in seconds (Linux /proc)."""
    if pid is None:
        return 0.0
    with open(f"/proc/{pid}/stat") as stat:
        fields = stat.read().rsplit(")", 1)[1].split()
    return (int(fields[11]) + int(fields[12])) / TICKS


def numpy_thermo(energies, degeneracies, grid):
    """ln Z, U / k_B (K), S / k_B, C_V / k_B by log-sum-exp, moments about the mean (two-pass)."""
    beta = 1.0 / grid
    y = np.log(degeneracies)[None, :] - np.outer(beta, energies)
    ln_z = logsumexp(y, axis=1)
    p = np.exp(y - ln_z[:, None])
    u = p @ energies
    cv = beta ** 2 * np.einsum("ji,ji->j", p, (energies[None, :] - u[:, None]) ** 2)
    s = ln_z + beta * u
    return ln_z, u, s, cv


def interleaved(functions, repeats, warmup):
    """Runs each function warmup times, then repeats rounds of one call each in turn, so that a
    change in the load of the (shared) machine hits all of them alike. Returns per function the
    median time, the times and the last result."""
    results = [None] * len(functions)
    for k, function in enumerate(functions):
        for _ in range(warmup):
            results[k] = function()
    times = [[] for _ in functions]
    for _ in range(repeats):
        for k, function in enumerate(functions):
            start = time.perf_counter()
            results[k] = function()
            times[k].append(time.perf_counter() - start)
    return [(statistics.median(t), t, r) for t, r in zip(times, results)]


def main(base, pid):
    energies, degeneracies, grid = dataset(100_000, 100, 20_261_201)
    body = request_body(energies, degeneracies, grid)
    print(f"1e5 levels x 100 temperatures; request body {len(body) / 1e6:.1f} MB")

    def decode_and_compute():
        req = json.loads(body)
        return numpy_thermo(np.array(req["levels"]["energies"]), np.array(req["levels"]["degeneracies"]),
                            np.array(req["temperatures"]["values"]))

    cpu = {"served": [], "numpy": []}

    def served():
        before = service_cpu_seconds(pid) + time.process_time()
        result = post(base, body)
        cpu["served"].append(service_cpu_seconds(pid) + time.process_time() - before)
        return result

    def computed():
        before = time.process_time()
        result = numpy_thermo(energies, degeneracies, grid)
        cpu["numpy"].append(time.process_time() - before)
        return result

    (served_median, served_times, answer), (numpy_median, numpy_times, mine), (with_json_median, _, _) = \
        interleaved([served, computed, decode_and_compute], REPEATS, WARMUP)

    names = ("logPartitionFunction", "internalEnergy", "entropy", "isochoricHeatCapacity")
    worst = max(float(np.max(np.abs(np.array(answer[n]["values"]) - ref) / np.maximum(np.abs(ref), 1e-300)))
                for n, ref in zip(names, mine))
    print(f"  statesum POST, end to end     median {served_median * 1e3:8.1f} ms  "
          f"(repeats: {' '.join(f'{t * 1e3:.0f}' for t in served_times)})")
    print(f"  NumPy/SciPy, arrays in memory median {numpy_median * 1e3:8.1f} ms  "
          f"(repeats: {' '.join(f'{t * 1e3:.0f}' for t in numpy_times)})")
    print(f"  NumPy/SciPy incl. json.loads  median {with_json_median * 1e3:8.1f} ms")
    print(f"  largest relative difference of ln Z, U, S, C_V between the two: {worst:.1e}")
    if "heatCapacityMaximum" in answer:
        print(f"  (statesum also located the C_V maximum: {answer['heatCapacityMaximum']['evaluations']} "
              f"one-temperature evaluations, included in its time)")
    ratio = numpy_median / served_median
    print(f"ratio NumPy time / statesum time = {ratio:.2f} (target > 1, statesum faster): "
          f"{'met' if ratio > 1 else 'MISSED'}")
    if pid is not None:
        served_cpu = statistics.median(cpu["served"][-REPEATS:])
        numpy_cpu = statistics.median(cpu["numpy"][-REPEATS:])
        print(f"  CPU time per evaluation (medians): statesum {served_cpu * 1e3:.0f} ms (service, all threads, "
              f"plus client), NumPy {numpy_cpu * 1e3:.0f} ms; ratio NumPy / statesum {numpy_cpu / served_cpu:.2f} "
              f"(clock ticks of {1e3 / TICKS:.0f} ms)")

    energies, degeneracies, _ = dataset(1_000_000, 1000, 7)
    big = json.dumps({
        "levels": {"energies": energies.tolist(), "degeneracies": degeneracies.tolist()},
        "energyUnit": "K",
        "temperatures": {"start": 100, "stop": 3000, "count": 1000},
    }).encode()
    start = time.perf_counter()
    answer = post(base, big)
    elapsed = time.perf_counter() - start
    finite = all(v is not None for v in answer["isochoricHeatCapacity"]["values"])
    print(f"1e6 levels x 1000 temperatures (1e9 pairs, default limits); body {len(big) / 1e6:.1f} MB: "
          f"{elapsed:.1f} s end to end, {len(answer['temperature']['values'])} temperatures answered, "
          f"all C_V finite: {finite}")


if __name__ == "__main__":
    main(sys.argv[1], int(sys.argv[2]) if len(sys.argv) > 2 else None)
