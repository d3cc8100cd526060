#pragma once
/// One named piece of solver state (a field, a history), as checkpoints store it.
#include <string>
#include <vector>

namespace veer {

/// A named array of doubles; the meaning and layout (e.g. ni * nj cells, i fastest) belong to
/// whoever wrote it.
struct NamedArray {
    std::string name;
    std::vector<double> values;
};

}  // namespace veer
