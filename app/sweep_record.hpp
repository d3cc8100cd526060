#pragma once
/// What the sweep keeps of one point: DIR/alpha_+04.00/sweep_point.json. The polar is built from
/// these records only, so a sweep can be gathered again from its folders (after an interrupted
/// run, after job-array points, after an MPI run).
#include <array>
#include <filesystem>
#include <nlohmann/json.hpp>
#include <optional>
#include <string>

namespace veer {

/// One figure's grid convergence over a sweep's three grids (postprocess/grid_convergence.hpp).
struct FigureGridError {
    std::array<double, 2> coarser = {};  ///< the figure on the two coarser grids
    double order = 0.0;                  ///< observed order (0 when the values did not change)
    double band = 0.0;                   ///< absolute error band of the finest value
    double gci = 0.0;                    ///< band / |finest value| (GCI_fine)
    std::string verdict;                 ///< verdict_name: "monotone", "oscillatory", ...
};

/// One point of a sweep as the polar sees it. Coefficients are time averages over whole cycles
/// for unsteady points, the converged values for steady ones.
struct PointRecord {
    double alpha = 0.0;           ///< degrees
    std::string folder;           ///< relative to the sweep folder, e.g. "alpha_+04.00"
    std::string final_run = ".";  ///< the run whose outputs describe the point, relative to folder
    std::string regime = "steady";        ///< "steady", "unsteady" or "failed"
    std::string status;                   ///< how the final run ended (converged, end time, ...)
    std::string note;                     ///< why the point went time-accurate, or failed
    double cl = 0.0, cd = 0.0, cm = 0.0;  ///< surface route (pressure + friction)
    /// What cl, cd and cm are: "converged steady" (with "; kept by a time-accurate check"),
    /// "settled time-accurate", "mean over N whole cycles", "mean over the second half of the
    /// record", "final instant of the time-accurate run", "settled in a bounded cycle: ..."
    /// (app/bounded_cycle.hpp; status "bounded cycle", the half band in the amplitudes) or
    /// "not converged". Never a comma:
    /// polar.csv writes it unquoted.
    std::string cl_basis = "converged steady";
    /// The converged steady Cl when the point's result is a later time-accurate one.
    std::optional<double> cl_steady;
    std::optional<double> cl_momentum;       ///< control-volume lift on the largest contour
    std::optional<double> contour_distance;  ///< that contour's distance as the grid places it
    std::optional<double> separation_upper, reattachment_upper;  ///< x/c, first ones from the LE
    std::optional<double> separation_lower, reattachment_lower;
    /// Upper surface: where the flow leaves the wall for good (no reattachment aft), x/c.
    std::optional<double> trailing_edge_separation_upper;
    /// A closed separation bubble on the upper surface ahead of the trailing-edge zone, other
    /// than a laminar bubble that a transition inside it closes (that one is the layer's normal
    /// way to turn turbulent at these Reynolds numbers, not separation onset).
    bool upper_bubble = false;
    /// Transition x/c per surface (postprocess/transition_locator.hpp); none when the surface
    /// stays laminar or the model has no turbulence index.
    std::optional<double> transition_upper, transition_lower;
    /// The first laminar bubble of the upper surface with a transition inside: (start, end) x/c.
    std::optional<double> laminar_bubble_upper, laminar_bubble_upper_end;
    /// The first turbulent separation of the upper surface, x/c.
    std::optional<double> turbulent_separation_upper;
    std::string model_warning;       ///< model_range_note of the point's case; empty when none
    std::optional<double> strouhal;  ///< f c / U_inf of the lift (unsteady points)
    double cl_amplitude = 0.0, cd_amplitude = 0.0, cm_amplitude = 0.0;  ///< half peak-to-peak
    int cycles = 0;       ///< whole cycles averaged over
    long iterations = 0;  ///< steps of the steady attempt plus the time-accurate run
    double wall_seconds = 0.0;
    std::string case_text;  ///< the steady point's case text: same text, same point
    /// Why the sweep added the point (its stall search, app/stall_search.hpp); empty for a
    /// requested angle. Set from the sweep plan, not kept in the point's record; no comma.
    std::string added_for;
    /// The discretisation error of cl and cd from the sweep's coarser grids (--error-bars,
    /// app/sweep_error_bars.hpp); none without them. Set when the polar is gathered.
    std::optional<FigureGridError> cl_grid, cd_grid;
};

/// x/c aft of which a separation of the upper surface is the trailing edge's own and does not
/// count as separation onset.
constexpr double trailing_edge_zone = 0.95;

/// Whether the upper surface of a point has separated ahead of the trailing-edge zone (a bubble
/// there, or reversed flow from ahead of it to the trailing edge): the separation-onset
/// criterion of the polar, and what makes a sweep check a converged point's stability.
bool upper_surface_separated(const PointRecord& r);

/// upper_surface_separated, or a closed laminar bubble on the upper surface: where a converged
/// steady point may still hide an unsteady flow, so the sweep checks its stability.
bool upper_surface_needs_stability_check(const PointRecord& r);

nlohmann::json record_to_json(const PointRecord& r);
/// Throws InputError naming `source` when a key is missing or of the wrong type.
PointRecord record_from_json(const nlohmann::json& j, const std::string& source);

/// The record file of a point folder.
std::filesystem::path record_path(const std::filesystem::path& point_dir);

/// The record in a point folder, whatever case it belongs to; nullopt when the folder has none.
/// Throws InputError naming the file when the record is damaged.
std::optional<PointRecord> read_point_record(const std::filesystem::path& point_dir);

/// The record of a finished point: its folder holds summary.json and a record of the same case
/// text; nullopt otherwise (missing, unreadable or another case).
std::optional<PointRecord> finished_point(const std::filesystem::path& point_dir,
                                          const std::string& case_text);

}  // namespace veer
