// The model interface holds: a model written here, in the test, and registered at run time (a
// passive scalar carried by the flow, first-order upwind, implicit) runs through `veer run`'s
// Simulation without any other file knowing it: the case file names it, it steps, its residual
// reaches history.csv and the convergence monitor, its variable reaches the checkpoint and the
// VTK frames, and a run interrupted and restarted from the checkpoint continues bit for bit.
#include <gtest/gtest.h>
#include <vtkCellData.h>
#include <vtkDataArray.h>
#include <vtkSmartPointer.h>
#include <vtkStructuredGrid.h>
#include <vtkXMLStructuredGridReader.h>

#include <algorithm>
#include <cmath>
#include <cstring>

#include "app/mesh_pipeline.hpp"
#include "app/simulation.hpp"
#include "io/case_file.hpp"
#include "io/checkpoint.hpp"
#include "io/field_series.hpp"
#include "io_test_support.hpp"
#include "solver/boundary_ghosts.hpp"
#include "solver/line_relaxation.hpp"
#include "solver/model_registry.hpp"
#include "solver/momentum_system.hpp"

namespace veer {
namespace {

constexpr const char* scalar_name = "passive_scalar";

/// c_t + u . grad c = 0 (advective form) with c = 1 where the free stream enters, zero gradient at
/// outflows and walls, c = 0 at the start: the upwind implicit step keeps c in [0, 1] and fills the
/// domain from the inflow.
class PassiveScalar final : public FlowModel {
public:
    explicit PassiveScalar(const ModelSetup& s)
        : m_geom(&s.geom),
          m_faces(&s.faces),
          m_connectivity(&s.connectivity),
          m_q(s.geom.ni, s.geom.nj),
          m_next(s.geom.ni, s.geom.nj),
          m_unused(s.geom.ni, s.geom.nj) {
        ScalarColumn column;
        column.inflow = {Condition::dirichlet, 1.0, {}};
        column.prescribed_velocity = {Condition::dirichlet, 0.0, {}};
        m_variables.push_back({scalar_name, "c", column});
        m_conditions = scalar_face_conditions(s.faces, column);
        m_system.resize(s.geom.ni, s.geom.nj);
        m_work.prepare(s.connectivity, false);  // j-lines end at a wake cut
    }

    const std::vector<ModelVariable>& variables() const override { return m_variables; }

    ModelStepReport advance(const ModelStepInputs& in) override {
        const FaceGeometry& g = *m_geom;
        fill_scalar_ghosts(*m_faces, m_conditions, *m_connectivity, m_q.view());
        assemble(in);
        m_next = m_q;
        relax_momentum(m_system, *m_connectivity, m_next.view(), m_unused.view(), 4, 0.0, m_work);
        ModelStepReport r;
        double sum = 0.0;
        for (int j = 0; j < g.nj; ++j)
            for (int i = 0; i < g.ni; ++i) {
                const double dt = in.steady ? in.local_dt(i, j) : in.dt;
                const double rate = (m_next(i, j) - m_q(i, j)) / dt;
                sum += rate * rate;
                if (!std::isfinite(m_next(i, j)) && r.finite) {
                    r.finite = false;
                    r.worst_i = i;
                    r.worst_j = j;
                    r.worst_variable = scalar_name;
                }
            }
        r.residuals = {std::sqrt(sum / static_cast<double>(g.volume.size()))};
        std::swap(m_q, m_next);
        return r;
    }

    bool has_eddy_viscosity() const override { return false; }
    std::vector<double> eddy_viscosity() const override {
        return std::vector<double>(m_geom->volume.size(), 0.0);
    }
    void face_eddy_viscosity(std::vector<double>& on_i, std::vector<double>& on_j) const override {
        std::fill(on_i.begin(), on_i.end(), 0.0);
        std::fill(on_j.begin(), on_j.end(), 0.0);
    }
    std::vector<NamedArray> values() const override { return {{scalar_name, m_q.interior()}}; }
    /// A further output field (as a transition model's intermittency is): 1 - c.
    std::vector<NamedArray> output_fields() const override {
        std::vector<double> rest = m_q.interior();
        for (double& x : rest) x = 1.0 - x;
        return {{"passive_scalar_complement", rest}};
    }
    void set_values(const std::vector<NamedArray>& arrays) override {
        for (const NamedArray& a : arrays)
            if (a.name == scalar_name) m_q.set_interior(a.values);
    }

private:
    /// Upwind fluxes implicit; physical faces folded with their conditions.
    void assemble(const ModelStepInputs& in) {
        const FaceGeometry& g = *m_geom;
        const std::vector<double>&fx = *in.flux_i, &fy = *in.flux_j;
        MomentumSystem& s = m_system;
        for (int j = 0; j < g.nj; ++j)
            for (int i = 0; i < g.ni; ++i) {
                const std::size_t c = g.cell(i, j);
                const double fw = fx[g.face_i(i, j)], fe = fx[g.face_i(i + 1, j)];
                const double fs = fy[g.face_j(i, j)], fn = fy[g.face_j(i, j + 1)];
                const double time = g.volume[c] / (in.steady ? in.local_dt(i, j) : in.dt);
                s.west[c] = std::max(fw, 0.0);
                s.east[c] = std::max(-fe, 0.0);
                s.south[c] = std::max(fs, 0.0);
                s.north[c] = std::max(-fn, 0.0);
                // Advective form u . grad c: the diagonal is the sum of the inflow coefficients,
                // so each update is a convex combination (bounded whatever the divergence error
                // of the fluxes in mid-iteration).
                s.diag[c] = time + s.west[c] + s.east[c] + s.south[c] + s.north[c];
                s.rhs_u[c] = time * m_q(i, j);
                s.rhs_v[c] = 0.0;
            }
        for (std::size_t k = 0; k < m_faces->size(); ++k) {
            const BoundaryFace& b = (*m_faces)[k];
            const std::size_t c = g.cell(b.i, b.j);
            double& slot = b.i_face ? (b.outward < 0 ? s.west[c] : s.east[c])
                                    : (b.outward < 0 ? s.south[c] : s.north[c]);
            if (m_conditions[k].dirichlet)
                s.rhs_u[c] += slot * m_conditions[k].value;  // the inflowing value is c_b
            else
                s.diag[c] -= slot;  // ghost = c_P: nothing changes across the face
            slot = 0.0;
        }
    }

    const FaceGeometry* m_geom;
    const std::vector<BoundaryFace>* m_faces;
    const Connectivity* m_connectivity;
    std::vector<ModelVariable> m_variables;
    std::vector<ScalarFaceCondition> m_conditions;
    CellField m_q, m_next, m_unused;
    MomentumSystem m_system;
    LineWork m_work;
};

/// The one registration line a model needs (here at run time, as a test can).
void register_passive_scalar() {
    ModelDescriptor d;
    d.name = "passive-scalar-test";
    d.description = "a passive scalar carried by the flow (test only)";
    d.make = [](const ModelSetup& s) -> std::unique_ptr<FlowModel> {
        return std::make_unique<PassiveScalar>(s);
    };
    register_model(d);
}

CaseSpec scalar_case(long steps) {
    return parse_case_text(
        "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 48\nnormal = 12\nwake = 10\n"
        "far_field = 8\nfirst_cell = 1e-2\n[flow]\nreynolds = 500\nalpha = 2\n"
        "model = \"passive-scalar-test\"\n[run]\nmode = \"steady\"\ncheckpoint_every = 1000\n"
        "steps = " +
            std::to_string(steps) + "\n",
        "scalar.toml", ".");
}

const NamedArray* array_named(const std::vector<NamedArray>& arrays, const std::string& name) {
    for (const NamedArray& a : arrays)
        if (a.name == name) return &a;
    return nullptr;
}

bool same_bits(const std::vector<double>& a, const std::vector<double>& b) {
    return a.size() == b.size() && std::memcmp(a.data(), b.data(), a.size() * sizeof(double)) == 0;
}

/// The cell array `name` of the last frame of the run in `dir`.
std::vector<double> last_frame_array(const std::filesystem::path& dir, const std::string& name) {
    const std::vector<SeriesFrame> frames = read_pvd(dir / "fields.pvd");
    EXPECT_FALSE(frames.empty());
    if (frames.empty()) return {};
    auto reader = vtkSmartPointer<vtkXMLStructuredGridReader>::New();
    reader->SetFileName((dir / frames.back().file).c_str());
    reader->Update();
    vtkDataArray* a = reader->GetOutput()->GetCellData()->GetArray(name.c_str());
    if (!a) return {};
    std::vector<double> out;
    for (vtkIdType c = 0; c < a->GetNumberOfTuples(); ++c) out.push_back(a->GetComponent(c, 0));
    return out;
}

TEST(ModelPlugin, ATestOnlyModelStepsRestartsAndReachesEveryOutput) {
    register_passive_scalar();
    test::ScratchDir scratch;
    SimulationOptions quiet;
    quiet.progress = false;
    const long total = 24, first = 11;

    std::filesystem::create_directories(scratch / "straight");
    std::filesystem::create_directories(scratch / "pieces");
    const CaseSpec whole = scalar_case(total);
    ASSERT_EQ(whole.model.name, "passive-scalar-test");
    Simulation straight(whole, build_mesh(whole).grid, scratch / "straight", quiet);
    ASSERT_EQ(straight.run().steps, total);

    const CaseSpec part = scalar_case(first);
    {
        Simulation interrupted(part, build_mesh(part).grid, scratch / "pieces", quiet);
        ASSERT_EQ(interrupted.run().steps, first);
    }
    const CheckpointData saved = read_checkpoint(scratch / "pieces" / "checkpoint.h5");
    const NamedArray* stored = array_named(saved.arrays, scalar_name);
    ASSERT_NE(stored, nullptr) << "the checkpoint holds the model's variable";
    Simulation resumed(whole, saved.grid, scratch / "pieces", quiet);
    resumed.resume(saved);
    ASSERT_EQ(resumed.run().steps, total);

    // Restart: the same bits as the uninterrupted run, scalar and flow alike.
    const std::vector<NamedArray> a = straight.solver().state(), b = resumed.solver().state();
    ASSERT_EQ(a.size(), b.size());
    for (std::size_t k = 0; k < a.size(); ++k) {
        EXPECT_EQ(a[k].name, b[k].name);
        EXPECT_TRUE(same_bits(a[k].values, b[k].values)) << a[k].name;
    }
    const std::string history = test::read_file_text(scratch / "pieces" / "history.csv");
    EXPECT_EQ(history, test::read_file_text(scratch / "straight" / "history.csv"));
    EXPECT_EQ(history.substr(0, history.find('\n')),
              "step,time,residual_u,residual_v,residual_continuity,cl,cd,cm,"
              "residual_passive_scalar");

    // The model stepped: the inflow value has been carried in, and the upwind step kept the
    // scalar within its boundary and initial values.
    const FlowFields fields = straight.solver().fields();
    const NamedArray* field = array_named(fields.model_fields, scalar_name);
    ASSERT_NE(field, nullptr);
    ASSERT_FALSE(field->values.empty());
    const auto [lo, hi] = std::minmax_element(field->values.begin(), field->values.end());
    EXPECT_GT(*hi, 0.99);
    EXPECT_GE(*lo, -1e-12);
    EXPECT_LE(*hi, 1.0 + 1e-12);
    const std::size_t at = history.rfind("\n" + std::to_string(total) + ",");
    ASSERT_NE(at, std::string::npos);
    const std::string last_row = history.substr(at + 1);
    const double scalar_residual = std::stod(last_row.substr(last_row.rfind(',') + 1));
    EXPECT_GT(scalar_residual, 0.0);

    // The VTK frame carries the variable exactly (Float64).
    const std::vector<double> frame = last_frame_array(scratch / "straight", scalar_name);
    ASSERT_EQ(frame.size(), field->values.size());
    EXPECT_TRUE(same_bits(frame, field->values));
    // And the model's further output field, after its variables.
    const NamedArray* extra = array_named(fields.model_fields, "passive_scalar_complement");
    ASSERT_NE(extra, nullptr);
    const std::vector<double> extra_frame =
        last_frame_array(scratch / "straight", "passive_scalar_complement");
    ASSERT_EQ(extra_frame.size(), field->values.size());
    EXPECT_TRUE(same_bits(extra_frame, extra->values));
    EXPECT_DOUBLE_EQ(extra_frame.front(), 1.0 - frame.front());
}

}  // namespace
}  // namespace veer
