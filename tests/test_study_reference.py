"""Spinfoil's dispersion statistics against NumPy and SciPy on the same samples.

source: NumPy (`numpy.cov` with the n − 1 denominator, `numpy.linalg.eigh`) and SciPy
(`scipy.stats.chi2.ppf` with 2 degrees of freedom) on the 2,000 seeded points printed by
`engine/examples/study_reference.rs`.
"""
import numpy as np
from scipy.stats import chi2

from conftest import run_example_json


def test_covariance_and_ellipse_axes_match_numpy():
    data = run_example_json("spinfoil-engine", "study_reference")
    points = np.array(data["points"])
    stats = data["stats"]
    assert stats["count"] == len(points) == 2000
    np.testing.assert_allclose(stats["mean_m"], points.mean(axis=0), rtol=1e-12)
    cov = np.cov(points.T)
    np.testing.assert_allclose(stats["covariance_m2"], cov, rtol=1e-10)
    eigenvalues, eigenvectors = np.linalg.eigh(cov)
    np.testing.assert_allclose(stats["eigenvalues_m2"], eigenvalues[::-1], rtol=1e-10)
    for key, level in (("ellipse_50", 0.5), ("ellipse_95", 0.95)):
        q = chi2.ppf(level, 2)
        ellipse = stats[key]
        np.testing.assert_allclose(ellipse["semi_major_m"], np.sqrt(q * eigenvalues[1]), rtol=1e-10)
        np.testing.assert_allclose(ellipse["semi_minor_m"], np.sqrt(q * eigenvalues[0]), rtol=1e-10)
    np.testing.assert_allclose([data["chi2_50"], data["chi2_95"]], chi2.ppf([0.5, 0.95], 2), rtol=1e-14)
    major = eigenvectors[:, 1]
    angle = np.degrees(np.arctan(major[1] / major[0]))
    assert abs(stats["ellipse_95"]["angle_deg"] - angle) < 1e-8
