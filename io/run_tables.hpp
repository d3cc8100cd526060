#pragma once
/// The tables of a run's folder: surface.csv, wake.csv and surface.vtp.
#include <filesystem>
#include <vector>

#include "postprocess/surface_distribution.hpp"
#include "postprocess/wake_profiles.hpp"

namespace veer {

/// x/c, y/c, side, Cp, Cf, y+ per wall face; lower surface then upper, each from the LE aft.
void write_surface_csv(const std::filesystem::path& path, const SurfaceDistribution& d);
/// station, x, y, u, v, flow angle, Cp per sample of each wake profile.
void write_wake_csv(const std::filesystem::path& path, const std::vector<WakeProfile>& wake);
/// The wall as VTK poly lines (lower, upper) with Cp, Cf and y+ for ParaView.
void write_surface_vtp_file(const std::filesystem::path& path, const SurfaceDistribution& d);

}  // namespace veer
