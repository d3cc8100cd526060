#include "solver/spalart_allmaras_family.hpp"

#include "mesh/wall_distance.hpp"

namespace veer {

SpalartAllmarasSettings with_free_stream_ratio(SpalartAllmarasSettings s, double ratio) {
    s.free_stream_ratio = ratio;
    return s;
}

SpalartAllmarasFamilyModel::SpalartAllmarasFamilyModel(const ModelSetup& s,
                                                       const SpalartAllmarasSettings& settings)
    : m_core(s.geom, s.faces, s.connectivity, wall_distance(s.grid, s.metrics), s.nu, settings) {
    m_variables.push_back({nu_tilde_name, "nu~", m_core.boundary_column()});
}

void SpalartAllmarasFamilyModel::set_values(const std::vector<NamedArray>& arrays) {
    for (const NamedArray& a : arrays)
        if (a.name == nu_tilde_name) m_core.set_nu_tilde(a.values);
}

ModelStepReport SpalartAllmarasFamilyModel::report_of(const TurbulenceReport& t) {
    ModelStepReport r;
    r.residuals = {t.residual};
    r.finite = t.finite;
    if (!t.finite) {
        r.worst_i = t.worst_i;
        r.worst_j = t.worst_j;
        r.worst_variable = nu_tilde_name;
    }
    return r;
}

}  // namespace veer
