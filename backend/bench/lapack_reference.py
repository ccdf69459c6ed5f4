"""
The LAPACK-based reference that `npm run bench` compares the engine with (issue 16): the same
full analysis of the same building (every mode, spectral values, each mode's storey responses,
and their SRSS, CQC and ABS), written the plain way with NumPy and SciPy. The eigenpairs come from
LAPACK's symmetric tridiagonal solver (scipy.linalg.eigh_tridiagonal, driver stemr) on
A = M^-1/2 K M^-1/2; the CQC of each quantity is a matrix product (BLAS dgemm). BLAS is held to
one thread, as the engine runs on one. Reads {"storeys": n, "repetitions": r} lines on stdin and
prints one JSON line per size with the median milliseconds, after a warm-up.
"""
import os

os.environ.setdefault("OPENBLAS_NUM_THREADS", "1")
os.environ.setdefault("OMP_NUM_THREADS", "1")
os.environ.setdefault("MKL_NUM_THREADS", "1")

import json  # noqa: E402
import sys  # noqa: E402
import time  # noqa: E402

import numpy as np  # noqa: E402
from scipy.linalg import eigh_tridiagonal  # noqa: E402

G = 9.80665
PERIODS = np.array([0.0, 0.15, 0.6, 8.0])
SA = np.array([0.4, 1.0, 1.0, 0.075])


def building(n):
    """The benchmark's building (bench-support.ts): mass and stiffness tapering up the height."""
    i = np.arange(n)
    mass = 4e5 * (1 - 0.4 * i / n)
    stiffness = 8e8 * (1 - 0.6 * i / n)
    height = np.where(i == 0, 4.5, 3.5)
    return mass, stiffness, height


def analyse(mass, stiffness, height, zeta=0.05):
    n = mass.size
    k_next = np.append(stiffness[1:], 0.0)
    diagonal = (stiffness + k_next) / mass
    root = np.sqrt(mass)
    off = -stiffness[1:] / (root[:-1] * root[1:])
    omega2, x = eigh_tridiagonal(diagonal, off)
    omega = np.sqrt(omega2)
    period = 2 * np.pi / omega
    phi = x / root[:, None]  # mass-normalised shapes
    l = mass @ phi  # participation of the mass-normalised shapes
    effective = l * l
    sa = np.interp(period, PERIODS, SA)
    a = sa * G
    displacement = phi * (l * a / omega2)
    force = (mass[:, None] * phi) * (l * a)
    drift = np.diff(displacement, axis=0, prepend=0.0)
    shear = np.cumsum(force[::-1], axis=0)[::-1]
    moment = np.cumsum((height[:, None] * shear)[::-1], axis=0)[::-1]
    beta = omega[None, :] / omega[:, None]
    rho = (8 * zeta**2 * (1 + beta) * beta**1.5) / (
        (1 - beta**2) ** 2 + 4 * zeta**2 * beta * (1 + beta) ** 2
    )
    out = {}
    for name, q in (
        ("displacement", displacement),
        ("drift", drift),
        ("floorForce", force),
        ("storeyShear", shear),
        ("overturningMoment", moment),
    ):
        out[name] = (
            np.sqrt((q * q).sum(axis=1)),
            np.sqrt(np.maximum(np.einsum("ij,ij->i", q @ rho, q), 0)),
            np.abs(q).sum(axis=1),
        )
    return period, effective, out


def main():
    for line in sys.stdin:
        if not line.strip():
            continue
        job = json.loads(line)
        n, repetitions = job["storeys"], job["repetitions"]
        args = building(n)
        for _ in range(5):
            analyse(*args)
        samples = []
        for _ in range(repetitions):
            start = time.perf_counter()
            analyse(*args)
            samples.append((time.perf_counter() - start) * 1000)
        print(json.dumps({"storeys": n, "medianMs": float(np.median(samples))}), flush=True)


if __name__ == "__main__":
    main()
