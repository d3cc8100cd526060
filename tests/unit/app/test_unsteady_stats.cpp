// Whole-cycle statistics and the Strouhal number of a lift signal, on synthetic records whose
// frequency, mean and amplitude are known exactly.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>
#include <random>

#include "postprocess/time_average.hpp"

namespace veer {
namespace {

ForceRecord sinusoid(double f, double mean, double amplitude, double noise, double duration,
                     double dt, unsigned seed = 7) {
    std::mt19937 rng(seed);
    std::normal_distribution<double> n(0.0, 1.0);
    ForceRecord r;
    for (double t = 0.0; t <= duration; t += dt) {
        const double phase = 2 * std::numbers::pi * f * t;
        r.time.push_back(t);
        r.cl.push_back(mean + amplitude * std::sin(phase) + noise * n(rng));
        r.cd.push_back(0.1 + 0.01 * std::sin(2 * phase));  // drag at twice the lift frequency
        r.cm.push_back(-0.02);
    }
    return r;
}

TEST(UnsteadyStats, StrouhalOfCleanSinusoid) {
    // 0.37 Hz over 40 time units: ~7 whole cycles in the second half. The peak refinement
    // evaluates the DFT at any frequency, so the error is set by the windowed sampling, far below
    // 1e-4 relative for a clean tone.
    const UnsteadyStats s = unsteady_stats(sinusoid(0.37, 0.8, 0.2, 0.0, 40.0, 0.01));
    ASSERT_TRUE(s.periodic);
    ASSERT_TRUE(s.strouhal);
    EXPECT_NEAR(*s.strouhal, 0.37, 0.37e-4);
    EXPECT_GE(s.cycles, 6);
    // Whole cycles: the mean of a sinusoid over them is its mean; the trapezoidal rule at 270
    // samples per cycle is exact to ~1e-6 for a smooth periodic signal.
    EXPECT_NEAR(s.cl_mean, 0.8, 1e-4);
    EXPECT_NEAR(s.cl_amplitude, 0.2, 1e-4);  // the sampled peak misses the true one by < dt^2
    EXPECT_NEAR(s.cd_mean, 0.1, 1e-5);
    EXPECT_NEAR(s.cm_mean, -0.02, 1e-12);
}

TEST(UnsteadyStats, StrouhalWithNoiseAndTransient) {
    // Noise of 20 % of the amplitude and a decaying start-up transient in the first half: the
    // hysteresis band keeps noise from adding crossings, the spectrum averages the noise out.
    // 0.2 % of the frequency is a quarter of the bin width 1/(window), far tighter than bins.
    ForceRecord r = sinusoid(0.62, 1.1, 0.15, 0.03, 60.0, 0.005, 11);
    for (std::size_t k = 0; k < r.time.size(); ++k) r.cl[k] += 0.5 * std::exp(-r.time[k] / 3.0);
    const UnsteadyStats s = unsteady_stats(r);
    ASSERT_TRUE(s.periodic);
    ASSERT_TRUE(s.strouhal);
    EXPECT_NEAR(*s.strouhal, 0.62, 0.62 * 2e-3);
    EXPECT_NEAR(s.cl_mean, 1.1, 0.01);  // noise of 0.03 averaged over ~6000 samples
    // The amplitude is half the peak-to-peak: noise widens it by about 3 sigma.
    EXPECT_GT(s.cl_amplitude, 0.15);
    EXPECT_LT(s.cl_amplitude, 0.15 + 4 * 0.03);
}

TEST(UnsteadyStats, SettledSignalHasNoCycles) {
    ForceRecord r;
    for (int k = 0; k < 200; ++k) {
        const double t = 0.1 * k;
        r.time.push_back(t);
        r.cl.push_back(0.5 + 0.2 * std::exp(-t));
        r.cd.push_back(0.05);
        r.cm.push_back(0.0);
    }
    const UnsteadyStats s = unsteady_stats(r);
    EXPECT_FALSE(s.periodic);
    EXPECT_FALSE(s.strouhal);
    EXPECT_NEAR(s.cl_mean, 0.5, 1e-4);  // exp(-10) of the transient is left in the second half
}

TEST(UnsteadyStats, CrossingsUseHysteresis) {
    // A square wave (period 100) with a chatter across the level just before each upward jump:
    // with the band only one crossing per cycle counts, without it the chatter adds one.
    std::vector<double> t, s;
    for (int k = 0; k < 400; ++k) {
        t.push_back(k);
        double v = (k / 50) % 2 == 0 ? -1.0 : 1.0;
        if (k % 100 == 48) v = 0.1;
        if (k % 100 == 49) v = -0.1;
        s.push_back(v);
    }
    EXPECT_EQ(upward_crossings(t, s, 0.0, 0.5).size(), 4u);
    EXPECT_EQ(upward_crossings(t, s, 0.0, 0.0).size(), 8u);
}

TEST(UnsteadyStats, DominantFrequencyNeedsSamples) {
    EXPECT_FALSE(dominant_frequency({0, 1, 2}, {0, 1, 0}, 0.0, 2.0));
}

}  // namespace
}  // namespace veer
