#include "mesh/errors.hpp"
#include "postprocess/time_average.hpp"

namespace veer {

namespace {

void accumulate(std::vector<double>& sum, const std::vector<double>& q, double w) {
    if (q.size() != sum.size()) return;  // a field the run does not carry (e.g. laminar)
    for (std::size_t c = 0; c < sum.size(); ++c) sum[c] += w * q[c];
}

}  // namespace

void FieldMean::add(const FlowFields& fields, double weight) {
    VEER_VERIFY(weight >= 0.0, "negative averaging weight");
    add_weighted(fields, weight);
    m_duration += weight;
}

void FieldMean::add(const FieldMean& other) {
    if (other.empty()) return;
    add_weighted(other.m_sum, 1.0);  // the sums already carry their weights
    m_duration += other.m_duration;
}

void FieldMean::add_weighted(const FlowFields& fields, double weight) {
    if (m_sum.u.empty()) {
        m_sum.ni = fields.ni;
        m_sum.nj = fields.nj;
        for (auto* q : {&m_sum.u, &m_sum.v, &m_sum.pressure, &m_sum.eddy_viscosity})
            q->assign(fields.u.size(), 0.0);
    }
    VEER_VERIFY(fields.u.size() == m_sum.u.size(), "fields of a different grid in one mean");
    accumulate(m_sum.u, fields.u, weight);
    accumulate(m_sum.v, fields.v, weight);
    accumulate(m_sum.pressure, fields.pressure, weight);
    accumulate(m_sum.eddy_viscosity, fields.eddy_viscosity, weight);
}

FlowFields FieldMean::mean() const {
    VEER_VERIFY(!empty(), "mean of no fields");
    FlowFields out = m_sum;
    for (auto* q : {&out.u, &out.v, &out.pressure, &out.eddy_viscosity})
        for (double& x : *q) x /= m_duration;
    return out;
}

}  // namespace veer
