// Round trips of the VTK writers through VTK's own XML readers (what ParaView uses).
#include <gtest/gtest.h>
#include <vtkCellArray.h>
#include <vtkCellData.h>
#include <vtkDataArray.h>
#include <vtkFieldData.h>
#include <vtkIdList.h>
#include <vtkPointData.h>
#include <vtkPolyData.h>
#include <vtkSmartPointer.h>
#include <vtkStructuredGrid.h>
#include <vtkXMLPolyDataReader.h>
#include <vtkXMLStructuredGridReader.h>

#include <vector>

#include "io/vtk_grid_writer.hpp"
#include "io_test_support.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

std::vector<double> ramp(std::size_t n, double scale) {
    std::vector<double> v(n);
    for (std::size_t k = 0; k < n; ++k)
        v[k] = scale * std::sin(1.0 + 0.37 * static_cast<double>(k));
    return v;
}

vtkSmartPointer<vtkStructuredGrid> read_vts(const std::filesystem::path& p) {
    auto reader = vtkSmartPointer<vtkXMLStructuredGridReader>::New();
    reader->SetFileName(p.c_str());
    reader->Update();
    return reader->GetOutput();
}

TEST(VtkGridWriter, StructuredGridRoundTripIsBitExact) {
    test::ScratchDir dir;
    const int ni = 7, nj = 4;
    const StructuredGrid grid = test::curved_grid(ni, nj);
    const auto cells = static_cast<std::size_t>(ni * nj);
    const auto nodes = grid.nodes().size();
    const std::vector<double> pressure = ramp(cells, 0.8);
    const std::vector<double> velocity_xy = ramp(2 * cells, 1.3);  // planar: becomes (x, y, 0)
    const std::vector<double> node_value = ramp(nodes, -2.1);
    const auto path = dir / "grid.vts";
    write_grid_vts(path, grid, {{"pressure", 1, &pressure}, {"velocity", 2, &velocity_xy}},
                   {{"node_value", 1, &node_value}}, 12.5);

    EXPECT_FALSE(std::filesystem::exists(dir / "grid.vts.tmp"));  // renamed into place
    const auto g = read_vts(path);
    int dims[3];
    g->GetDimensions(dims);
    EXPECT_EQ(dims[0], ni + 1);
    EXPECT_EQ(dims[1], nj + 1);
    EXPECT_EQ(dims[2], 1);
    ASSERT_EQ(g->GetNumberOfCells(), ni * nj);
    // Float64 binary all the way: exact equality is the right test, any tolerance would hide a
    // float or ASCII stage.
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i) {
            double p[3];
            g->GetPoint(static_cast<vtkIdType>(j * (ni + 1) + i), p);
            EXPECT_EQ(p[0], grid.node(i, j).x);
            EXPECT_EQ(p[1], grid.node(i, j).y);
            EXPECT_EQ(p[2], 0.0);
        }
    vtkDataArray* p = g->GetCellData()->GetArray("pressure");
    vtkDataArray* vel = g->GetCellData()->GetArray("velocity");
    vtkDataArray* nv = g->GetPointData()->GetArray("node_value");
    ASSERT_TRUE(p && vel && nv);
    EXPECT_EQ(p->GetNumberOfComponents(), 1);
    EXPECT_EQ(vel->GetNumberOfComponents(), 3);
    for (std::size_t c = 0; c < cells; ++c) {
        const auto id = static_cast<vtkIdType>(c);
        EXPECT_EQ(p->GetComponent(id, 0), pressure[c]);
        EXPECT_EQ(vel->GetComponent(id, 0), velocity_xy[2 * c]);
        EXPECT_EQ(vel->GetComponent(id, 1), velocity_xy[2 * c + 1]);
        EXPECT_EQ(vel->GetComponent(id, 2), 0.0);
    }
    for (std::size_t n = 0; n < nodes; ++n)
        EXPECT_EQ(nv->GetComponent(static_cast<vtkIdType>(n), 0), node_value[n]);
    vtkDataArray* t = g->GetFieldData()->GetArray("TimeValue");
    ASSERT_TRUE(t);
    EXPECT_EQ(t->GetComponent(0, 0), 12.5);
}

TEST(VtkGridWriter, FileIsAppendedCompressedWithWideHeaders) {
    test::ScratchDir dir;
    const StructuredGrid grid = test::curved_grid(3, 2);
    write_grid_vts(dir / "g.vts", grid);
    const std::string text = test::read_file_text(dir / "g.vts");
    const std::string head = text.substr(0, text.find("<AppendedData"));
    EXPECT_NE(head.find("header_type=\"UInt64\""), std::string::npos) << head;
    EXPECT_NE(head.find("compressor=\"vtkZLibDataCompressor\""), std::string::npos) << head;
    EXPECT_NE(text.find("<AppendedData encoding=\"raw\""), std::string::npos);
}

TEST(VtkGridWriter, ThreeComponentVectorsAreKept) {
    test::ScratchDir dir;
    const StructuredGrid grid = test::curved_grid(2, 2);
    const std::vector<double> u = ramp(4, 1.0), v = ramp(4, 2.0);
    const std::vector<double> xyz = interleave_xy0(u, v);
    write_grid_vts(dir / "g.vts", grid, {{"velocity", 3, &xyz}});
    const auto g = read_vts(dir / "g.vts");  // keeps the dataset (and its arrays) alive
    vtkDataArray* a = g->GetCellData()->GetArray("velocity");
    ASSERT_TRUE(a);
    for (vtkIdType c = 0; c < 4; ++c) {
        EXPECT_EQ(a->GetComponent(c, 0), u[static_cast<std::size_t>(c)]);
        EXPECT_EQ(a->GetComponent(c, 1), v[static_cast<std::size_t>(c)]);
        EXPECT_EQ(a->GetComponent(c, 2), 0.0);
    }
}

TEST(VtkGridWriter, WrongArraySizeIsRefused) {
    test::ScratchDir dir;
    const StructuredGrid grid = test::curved_grid(3, 2);
    const std::vector<double> too_short(5, 0.0);
    EXPECT_THROW(write_grid_vts(dir / "g.vts", grid, {{"pressure", 1, &too_short}}), InternalError);
    EXPECT_FALSE(std::filesystem::exists(dir / "g.vts"));
}

TEST(VtkGridWriter, UnwritablePathNamesTheFile) {
    test::ScratchDir dir;
    const auto path = dir / "no_such_folder" / "g.vts";
    try {
        write_grid_vts(path, test::curved_grid(2, 2));
        FAIL() << "expected an InputError";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find(path.string()), std::string::npos) << e.what();
    }
}

TEST(VtkGridWriter, SurfaceRoundTripKeepsLinesAndArrays) {
    test::ScratchDir dir;
    std::vector<Vec2> points;
    for (int k = 0; k < 9; ++k) points.push_back({0.1 * k + 1e-3 / 3.0, std::sin(0.3 * k) / 11.0});
    const std::vector<double> cp = ramp(points.size(), -1.7);
    const std::vector<double> cf = ramp(points.size(), 0.02);
    const auto path = dir / "surface.vtp";
    write_surface_vtp(path, points, {{"Cp", 1, &cp}, {"Cf", 1, &cf}}, {0, 5});

    auto reader = vtkSmartPointer<vtkXMLPolyDataReader>::New();
    reader->SetFileName(path.c_str());
    reader->Update();
    vtkPolyData* s = reader->GetOutput();
    ASSERT_EQ(s->GetNumberOfPoints(), 9);
    ASSERT_EQ(s->GetNumberOfLines(), 2);
    for (vtkIdType n = 0; n < 9; ++n) {
        double p[3];
        s->GetPoint(n, p);
        EXPECT_EQ(p[0], points[static_cast<std::size_t>(n)].x);
        EXPECT_EQ(p[1], points[static_cast<std::size_t>(n)].y);
        EXPECT_EQ(s->GetPointData()->GetArray("Cp")->GetComponent(n, 0),
                  cp[static_cast<std::size_t>(n)]);
        EXPECT_EQ(s->GetPointData()->GetArray("Cf")->GetComponent(n, 0),
                  cf[static_cast<std::size_t>(n)]);
    }
    vtkNew<vtkIdList> ids;
    s->GetLines()->InitTraversal();
    s->GetLines()->GetNextCell(ids);
    ASSERT_EQ(ids->GetNumberOfIds(), 5);
    EXPECT_EQ(ids->GetId(0), 0);
    EXPECT_EQ(ids->GetId(4), 4);
    s->GetLines()->GetNextCell(ids);
    ASSERT_EQ(ids->GetNumberOfIds(), 4);
    EXPECT_EQ(ids->GetId(0), 5);
    EXPECT_EQ(ids->GetId(3), 8);
}

TEST(VtkGridWriter, SurfaceLineOfOnePointIsRefused) {
    test::ScratchDir dir;
    const std::vector<Vec2> points{{0, 0}, {1, 0}, {2, 0}};
    EXPECT_THROW(write_surface_vtp(dir / "s.vtp", points, {}, {0, 2}), InternalError);
}

}  // namespace
}  // namespace veer
