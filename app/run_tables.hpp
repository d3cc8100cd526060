#pragma once
/// The tabular outputs of a run: surface.csv, wake.csv, surface.vtp and the closing table.
#include <filesystem>
#include <vector>

#include "io/case_spec.hpp"
#include "postprocess/surface_distribution.hpp"
#include "postprocess/wake_profiles.hpp"

namespace veer {

struct RunAnalysis;
struct UnsteadyFigures;

/// x/c, y/c, side, Cp, Cf, y+ per wall face; lower surface then upper, each from the LE aft.
void write_surface_csv(const std::filesystem::path& path, const SurfaceDistribution& d);
/// station, x, y, u, v, flow angle, Cp per sample of each wake profile.
void write_wake_csv(const std::filesystem::path& path, const std::vector<WakeProfile>& wake);
/// The wall as VTK poly lines (lower, upper) with Cp, Cf and y+ for ParaView.
void write_surface_vtp_file(const std::filesystem::path& path, const SurfaceDistribution& d);
/// Lift from each route and the largest disagreement, drag, moment, separation, Kutta check
/// (for the circle: base pressure, separation angles, recirculation length); for time-accurate
/// runs (`unsteady`) the time means over whole cycles with their cycle-to-cycle spread; the
/// cautions.
void print_closing_table(const CaseSpec& spec, const RunAnalysis& a,
                         const UnsteadyFigures* unsteady = nullptr);

}  // namespace veer
