#include "io/run_tables.hpp"

#include <fmt/format.h>

#include <cmath>

#include "io/atomic_file.hpp"
#include "io/vtk_grid_writer.hpp"

namespace veer {
namespace {

std::string surface_rows(const std::vector<SurfacePoint>& side, const char* name) {
    std::string out;
    for (const SurfacePoint& p : side)
        out += fmt::format(
            "{:.8f},{:.8f},{},{:.8e},{:.8e},{:.6e},{}\n", p.x, p.y, name, p.cp, p.cf, p.y_plus,
            std::isfinite(p.turbulence_index) ? fmt::format("{:.6e}", p.turbulence_index)
                                              : std::string());  // empty: no nu~ (a laminar model)
    return out;
}

}  // namespace

void write_surface_csv(const std::filesystem::path& path, const SurfaceDistribution& d) {
    write_text_atomically(path, "x_c,y_c,side,cp,cf,y_plus,turbulence_index\n" +
                                    surface_rows(d.lower, "lower") +
                                    surface_rows(d.upper, "upper"));
}

void write_wake_csv(const std::filesystem::path& path, const std::vector<WakeProfile>& wake) {
    std::string out = "station,x,y,u,v,flow_angle_deg,cp\n";
    for (const WakeProfile& w : wake)
        for (const WakeSample& s : w.samples)
            out += fmt::format("{:g},{:.8f},{:.8f},{:.8e},{:.8e},{:.6f},{:.8e}\n", w.station, w.x,
                               s.y, s.u, s.v, s.flow_angle_deg, 2.0 * s.pressure);
    write_text_atomically(path, out);
}

void write_surface_vtp_file(const std::filesystem::path& path, const SurfaceDistribution& d) {
    std::vector<Vec2> points;
    std::vector<double> cp, cf, y_plus;
    auto add = [&](const std::vector<SurfacePoint>& side) {
        for (const SurfacePoint& p : side) {
            points.push_back({p.x, p.y});
            cp.push_back(p.cp);
            cf.push_back(p.cf);
            y_plus.push_back(p.y_plus);
        }
    };
    add(d.lower);
    add(d.upper);
    write_surface_vtp(path, points, {{"Cp", 1, &cp}, {"Cf", 1, &cf}, {"y_plus", 1, &y_plus}},
                      {0, d.lower.size()});
}

}  // namespace veer
