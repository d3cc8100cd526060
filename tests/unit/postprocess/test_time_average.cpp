// Whole-cycle detection and averages on synthetic lift signals.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <numbers>

#include "postprocess/time_average.hpp"

namespace veer {
namespace {

constexpr double period = 2.5, amplitude = 0.2, mean_cl = 0.5;
constexpr double dt = period / 97.3;  // not commensurate with the period

/// Shedding-like lift: a sine plus its second harmonic after a decaying start-up transient.
double lift(double t) {
    const double w = 2.0 * std::numbers::pi / period;
    return mean_cl + amplitude * std::sin(w * t) + 0.3 * amplitude * std::sin(2.0 * w * t + 0.4) +
           0.4 * std::exp(-t / period);
}

struct Record {
    std::vector<double> time, cl;
};

Record record(double duration, double jitter) {
    Record r;
    for (int k = 1; k * dt <= duration; ++k) {
        const double t = k * dt;
        r.time.push_back(t);
        r.cl.push_back(lift(t) + jitter * amplitude * std::sin(37.0 * k));  // sample jitter
    }
    return r;
}

TEST(TimeAverage, FindsTheLastWholeCyclesAndTheirMean) {
    const Record r = record(20.0 * period, 0.0);
    const auto w = last_whole_cycles(r.time, r.cl, 4);
    ASSERT_TRUE(w.has_value());
    EXPECT_EQ(w->cycles, 4);
    // Crossing times come from linear interpolation between samples, off by O(dt^2) times the
    // curvature of the signal: well under 1e-3 of a period at 97 samples a cycle.
    EXPECT_NEAR(w->period(), period, 1e-3 * period);
    EXPECT_GT(w->end, r.time.back() - period);  // the last crossing of the record
    // The transient has decayed to e^-16 by then; the trapezoid mean over whole cycles of a
    // periodic signal is off by the end interpolation only, O(dt^2) relative.
    EXPECT_NEAR(window_average(r.time, r.cl, *w), mean_cl + 0.4 * std::exp(-18.0), 1e-4);
}

TEST(TimeAverage, HysteresisIgnoresSampleJitter) {
    const Record clean = record(20.0 * period, 0.0);
    const Record noisy = record(20.0 * period, 0.05);  // 5% of the amplitude, every sample
    const auto a = last_whole_cycles(clean.time, clean.cl, 10);
    const auto b = last_whole_cycles(noisy.time, noisy.cl, 10);
    ASSERT_TRUE(a && b);
    EXPECT_EQ(b->cycles, 10);
    // Jitter moves each crossing by at most about jitter / slope, a few percent of dt.
    EXPECT_NEAR(b->period(), a->period(), 0.01 * period);
}

TEST(TimeAverage, SteadyOrShortRecordsHaveNoCycles) {
    std::vector<double> t, s;
    for (int k = 0; k < 200; ++k) {
        t.push_back(k * dt);
        s.push_back(0.7 + 1e-3 * std::exp(-k * dt));  // converging, not oscillating
    }
    EXPECT_FALSE(last_whole_cycles(t, s, 3).has_value());
    const Record r = record(0.8 * period, 0.0);
    EXPECT_FALSE(last_whole_cycles(r.time, r.cl, 3).has_value());
}

TEST(CycleAverager, MeanFieldsOverWholeCycles) {
    CycleAverager averager(5);
    FlowFields f;
    f.ni = 2;
    f.nj = 1;
    f.v.assign(2, 0.0);
    f.pressure.assign(2, 0.0);
    double t = 0.0;
    while (t < 20.0 * period) {
        t += dt;
        const double cl = lift(t);
        f.u.assign(2, cl);  // the field carries the lift itself: its mean is known
        f.v.assign(2, 1.0);
        averager.add(t, dt, cl, f);
    }
    EXPECT_EQ(averager.completed_cycles(), 5);
    const auto w = averager.window(3);
    ASSERT_TRUE(w.has_value());
    EXPECT_NEAR(w->period(), period, 1e-3 * period);
    const FlowFields m = averager.mean_of_last(3);
    // Each step's value stands for its whole step (rectangle rule), split at the crossings:
    // over whole cycles of a smooth periodic signal that is accurate to O(dt^2).
    EXPECT_NEAR(m.u[0], mean_cl, 1e-3);
    EXPECT_NEAR(m.v[1], 1.0, 1e-14);  // a constant is averaged exactly
    EXPECT_EQ(m.eddy_viscosity.size(), 2u);
    EXPECT_EQ(m.eddy_viscosity[0], 0.0);  // laminar input: zeros
}

TEST(TimeAverage, WindowChangeRateIsTheMeanOfTheDerivative) {
    // q = t^2 sampled every 0.1: linear interpolation at the window's ends, so the rate is exact
    // for the interpolant: (q(b) - q(a)) / (b - a) with q(a), q(b) on the chords between samples.
    std::vector<double> t, q;
    for (int k = 0; k <= 100; ++k) {
        t.push_back(0.1 * k);
        q.push_back(0.01 * k * k);
    }
    const CycleWindow w{2.0, 7.0, 1};  // on samples: exact q
    EXPECT_NEAR(window_change_rate(t, q, w), (49.0 - 4.0) / 5.0, 1e-12);
    const CycleWindow between{2.05, 6.95, 1};  // between samples: chord values
    const double qa = 0.5 * (4.0 + 4.41), qb = 0.5 * (47.61 + 49.0);
    EXPECT_NEAR(window_change_rate(t, q, between), (qb - qa) / 4.9, 1e-12);
}

/// Cl = lift(t) with an amplitude scaled by growth^(t / period); Cd = 1.3 + 0.01 cos(2 w t); Cm =
/// 0.
struct Forces {
    std::vector<double> time, cl, cd, cm;
};

Forces shedding(double duration, double growth) {
    Forces f;
    const double w = 2.0 * std::numbers::pi / period;
    for (int k = 1; k * dt <= duration; ++k) {
        const double t = k * dt, scale = std::pow(growth, t / period);
        f.time.push_back(t);
        f.cl.push_back(mean_cl + scale * (lift(t) - mean_cl - 0.4 * std::exp(-t / period)));
        f.cd.push_back(1.3 + 0.01 * std::cos(2.0 * w * t));
        f.cm.push_back(0.0);
    }
    return f;
}

TEST(SheddingStatistics, FiguresOfAPeriodicRecordAndTheirSpread) {
    const Forces f = shedding(30.0 * period, 1.0);
    const auto s = shedding_statistics(f.time, f.cl, f.cd, f.cm, 10);
    ASSERT_TRUE(s.has_value());
    EXPECT_EQ(s->cycles, 10);
    EXPECT_TRUE(s->periodic) << s->not_periodic;
    // Crossings interpolated linearly at 97 samples a cycle: O(dt^2) of a period.
    EXPECT_NEAR(s->strouhal.value, 1.0 / period, 1e-3 / period);
    EXPECT_LT(s->strouhal.spread, 2e-3 / period);
    // Window means of exact harmonics over whole cycles: off by the end interpolation only.
    EXPECT_NEAR(s->cl_mean.value, mean_cl, 1e-4);
    EXPECT_NEAR(s->cd_mean.value, 1.3, 1e-5);
    // rms of A sin(wt) + 0.3 A sin(2wt + 0.4) is A sqrt((1 + 0.09) / 2); trapezoid error O(dt^2).
    EXPECT_NEAR(s->cl_rms.value, amplitude * std::sqrt(1.09 / 2.0), 1e-4);
    // Half the peak-to-peak range and the peak of the sampled signal, within a sample's change.
    const double step_change = amplitude * 2.0 * std::numbers::pi / 97.3;
    double hi = -1.0, lo = 1.0;
    for (int k = 0; k < 100000; ++k) {
        const double t = period * k / 100000.0;
        const double x = lift(t + 40.0 * period) - mean_cl;
        hi = std::max(hi, x);
        lo = std::min(lo, x);
    }
    EXPECT_NEAR(s->cl_amplitude.value, 0.5 * (hi - lo), step_change);
    EXPECT_NEAR(s->cl_peak.value, std::max(hi, -lo), step_change);
    EXPECT_NEAR(s->cd_amplitude.value, 0.01, 1e-4);
    EXPECT_LT(s->cl_amplitude.spread, step_change);
}

TEST(SheddingStatistics, AGrowingLiftIsNotYetPeriodic) {
    const Forces f = shedding(30.0 * period, 1.05);  // 5 % a cycle
    const auto s = shedding_statistics(f.time, f.cl, f.cd, f.cm, 6);
    ASSERT_TRUE(s.has_value());
    EXPECT_FALSE(s->periodic);
    EXPECT_NE(s->not_periodic.find("grows"), std::string::npos) << s->not_periodic;
    // The same signal falling: the words say so.
    const Forces g = shedding(30.0 * period, 1.0 / 1.05);
    const auto d = shedding_statistics(g.time, g.cl, g.cd, g.cm, 6);
    ASSERT_TRUE(d.has_value());
    EXPECT_FALSE(d->periodic);
    EXPECT_NE(d->not_periodic.find("falls"), std::string::npos) << d->not_periodic;
}

TEST(SheddingStatistics, TooFewCyclesOrNoneAtAll) {
    const Forces f = shedding(3.3 * period, 1.0);
    const auto s = shedding_statistics(f.time, f.cl, f.cd, f.cm, 10);
    ASSERT_TRUE(s.has_value());
    EXPECT_LT(s->cycles, 3);
    EXPECT_FALSE(s->periodic);
    EXPECT_NE(s->not_periodic.find("only"), std::string::npos) << s->not_periodic;
    std::vector<double> t, flat;
    for (int k = 0; k < 300; ++k) {
        t.push_back(k * dt);
        flat.push_back(0.3);
    }
    EXPECT_FALSE(shedding_statistics(t, flat, flat, flat, 5).has_value());
}

}  // namespace
}  // namespace veer
