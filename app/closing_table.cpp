#include "app/closing_table.hpp"

#include <fmt/format.h>

#include <cmath>
#include <string>

#include "app/reader_labels.hpp"
#include "app/run_report.hpp"
#include "app/transition_figures.hpp"
#include "postprocess/wake_profiles.hpp"

namespace veer {
namespace {

/// Below this |Cl| the disagreement is given without a percentage (a thousandth of the lift of
/// one degree on a thin section, 2 pi per radian: common practice for "no lift").
constexpr double near_zero_lift = 1e-4;

std::string separation_text(const SurfaceSeparation& s) {
    if (s.separations.empty()) return "attached";
    std::string out = fmt::format("separates at x/c {:.3f}", s.separations.front().x);
    if (s.trailing_edge_separation) out += ", reversed to the trailing edge";
    for (const SeparationBubble& b : s.bubbles)
        out += fmt::format(", bubble {:.3f}-{:.3f}", b.start.x, b.end.x);
    return out;
}

void print_routes(const CaseSpec& spec, const RunAnalysis& a, bool unsteady) {
    const double cl = a.forces.cl.total;
    const bool circle = spec.geometry.circle;
    fmt::print("  {:<34} {:>10} {:>10} {:>13}\n", "route", "Cl", "Cd", difference_header);
    fmt::print("  {:<34} {:>10.5f} {:>10.5f} {:>13}\n", "surface (pressure + friction)", cl,
               a.forces.cd.total, "-");
    for (const RouteComparison& r : a.routes)
        fmt::print("  {:<34} {:>10.5f} {:>10.5f} {:>+13.5f}\n",
                   control_volume_label(r.contour.distance, circle), r.cl_momentum, r.cd_momentum,
                   r.cl_momentum_difference);
    for (const RouteComparison& r : a.routes)
        fmt::print("  {:<34} {:>10.5f} {:>10} {:>+13.5f}\n",
                   circulation_label(r.contour.distance, circle), r.cl_circulation, "",
                   r.cl_circulation_difference);
    const RouteComparison& o = a.outermost;  // the far-boundary force check
    fmt::print("  {:<34} {:>10.5f} {:>10.5f} {:>+13.5f}\n",
               outermost_label(o.contour.distance, circle), o.cl_momentum, o.cd_momentum,
               o.cl_momentum_difference);
    if (!a.routes.empty()) fmt::print("  {}\n", circulation_note);
    if (unsteady) {
        fmt::print(
            "  (this instant: the control-volume rows leave out the rate of change of the "
            "momentum inside, so they differ from the surface in unsteady flow; compare the "
            "time means below)\n");
        return;
    }
    const double worst = a.max_lift_disagreement;
    // A percentage of a lift near zero (a symmetric section at zero incidence) says nothing.
    if (std::abs(cl) >= near_zero_lift)
        fmt::print("  largest surface/control-volume disagreement: {:.5f} ({:.2f}% of Cl)\n", worst,
                   100 * worst / std::abs(cl));
    else
        fmt::print("  largest surface/control-volume disagreement: {:.5f} (Cl near zero)\n", worst);
}

void print_section_lines(const RunAnalysis& a) {
    fmt::print(
        "  Cm {:.5f} ({}); Kutta check: Cp upper {:.4f}, lower {:.4f} at the trailing edge\n",
        a.forces.cm.total, cm_convention, a.kutta.cp_upper, a.kutta.cp_lower);
    fmt::print("  upper surface {}; lower surface {}\n", separation_text(a.separation.upper),
               separation_text(a.separation.lower));
    if (!a.wake.empty())
        fmt::print("  wake: downwash in deg; {}\n",
                   downward_flux_words(WakeProfileOptions{}.half_height));
    if (const std::string t = transition_line(a); !t.empty()) {
        fmt::print("  {}\n", t);
        const std::string up = regions_text(a.regions_upper), low = regions_text(a.regions_lower);
        if (!up.empty() || !low.empty())
            fmt::print("  separated regions: upper {}; lower {}\n", up.empty() ? "none" : up,
                       low.empty() ? "none" : low);
    }
    for (const WakeProfile& w : a.wake)
        fmt::print(
            "  wake {:.2f} chords behind the TE: downwash {:+.3f} deg, downward momentum "
            "flux {:.5f}\n",
            w.station, w.downwash_deg, w.downward_momentum_flux);
}

void print_circle_lines(const RunAnalysis& a) {
    const CircleFigures& c = *a.circle;
    auto angle = [](const std::optional<double>& v) {
        return v ? fmt::format("{:.2f} deg from the rear point", *v) : std::string("none");
    };
    fmt::print("  Cm (about the centre) {:.5f}; base Cp (rear point) {:.4f}\n", a.forces.cm.total,
               c.base_cp);
    fmt::print("  separation: upper half {}, lower half {}\n", angle(c.separation_angle_upper),
               angle(c.separation_angle_lower));
    if (c.recirculation_length)
        fmt::print("  recirculation length {:.4f} diameters behind the rear point\n",
                   *c.recirculation_length);
    for (const WakeProfile& w : a.wake)
        fmt::print("  wake {:.2f} diameters behind the rear point: mean flow angle {:+.3f} deg\n",
                   w.station, w.mean_flow_angle_deg);
}

void print_time_means(const CaseSpec& spec, const UnsteadyFigures& u) {
    if (!u.shedding) {
        fmt::print("\n  time means: no whole cycle of the lift in the record\n");
        return;
    }
    const SheddingStatistics& s = *u.shedding;
    fmt::print(
        "\n  time means over the last {} whole cycles of the lift, t = {:.2f} to {:.2f} "
        "(figure, largest cycle-to-cycle deviation)\n",
        s.cycles, s.window.begin, s.window.end);
    fmt::print("  Strouhal number {:.5f} ({:.1e}); mean Cd {:.5f} ({:.1e}); mean Cl {:+.5f}\n",
               s.strouhal.value, s.strouhal.spread, s.cd_mean.value, s.cd_mean.spread,
               s.cl_mean.value);
    fmt::print("  Cl rms {:.5f} ({:.1e}), peak {:.5f} ({:.1e}); Cd amplitude {:.5f}\n",
               s.cl_rms.value, s.cl_rms.spread, s.cl_peak.value, s.cl_peak.spread,
               s.cd_amplitude.value);
    if (!s.periodic) fmt::print("  not yet periodic: {}\n", s.not_periodic);
    if (!u.routes) return;
    for (const RouteMean& r : *u.routes)
        fmt::print(
            "  control volume at {:.2f} {}: mean Cl {:+.5f} (surface {:+.5f}), mean Cd "
            "{:.5f} ({:+.2f}% of the surface's)\n",
            r.contour.distance, length_words(spec.geometry.circle), r.cl, r.cl - s.cl_mean.value,
            r.cd, 100 * (r.cd - s.cd_mean.value) / s.cd_mean.value);
}

}  // namespace

void print_closing_table(const CaseSpec& spec, const RunAnalysis& a, const UnsteadyFigures* u) {
    if (spec.geometry.circle)
        fmt::print(
            "\n  forces two ways ({}, Re {:g} on the diameter; coefficients per unit span "
            "on the diameter)\n",
            spec.geometry.name, spec.flow.reynolds);
    else
        fmt::print("\n  lift two ways ({} at alpha {:g} deg, Re {:g})\n", spec.geometry.name,
                   spec.flow.alpha_deg, spec.flow.reynolds);
    print_routes(spec, a, u != nullptr);
    if (a.circle)
        print_circle_lines(a);
    else
        print_section_lines(a);
    if (u) print_time_means(spec, *u);
}

}  // namespace veer
