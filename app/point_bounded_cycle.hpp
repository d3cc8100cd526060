#pragma once
/// A sweep point whose steady attempt circles in a bounded cycle (app/bounded_cycle.hpp): the
/// cycle's means and band into the point's record.
#include <string>

#include "app/bounded_cycle.hpp"
#include "app/sweep_record.hpp"

namespace veer {

/// The record's coefficients become the cycle's means, its amplitudes the half band; regime
/// "steady", status "bounded cycle", cl_basis and note say so; `why` says why the attempt did not
/// converge.
void take_bounded_cycle(PointRecord& r, const BoundedCycle& c, const std::string& why);

}  // namespace veer
