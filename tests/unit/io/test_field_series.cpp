// The frame series: frame contents read back through VTK, the .pvd list in order with exact
// times, and its survival across a restart.
#include <gtest/gtest.h>
#include <vtkCellData.h>
#include <vtkDataArray.h>
#include <vtkSmartPointer.h>
#include <vtkStructuredGrid.h>
#include <vtkXMLStructuredGridReader.h>

#include <cmath>
#include <fstream>

#include "io/field_series.hpp"
#include "io_test_support.hpp"
#include "mesh/errors.hpp"
#include "postprocess/vorticity.hpp"

namespace veer {
namespace {

struct Case {
    StructuredGrid grid = test::curved_grid(6, 4);
    GridMetrics metrics = compute_metrics(grid);
    FlowFields flow;
    Case() {
        flow.ni = 6;
        flow.nj = 4;
        for (std::size_t c = 0; c < metrics.centroid.size(); ++c) {
            const Vec2 x = metrics.centroid[c];
            flow.u.push_back(1.0 + 0.3 * x.y);
            flow.v.push_back(0.1 * std::sin(5.0 * x.x));
            flow.pressure.push_back(-0.5 * x.x * x.y / 3.0);
            flow.eddy_viscosity.push_back(1e-4 * static_cast<double>(c));
        }
    }
};

TEST(FieldSeries, FrameHoldsTheFlowArrays) {
    test::ScratchDir dir;
    Case k;
    FieldSeries series(dir.path(), SeriesStart::fresh);
    const std::vector<double> marker(24, 7.25);
    const auto frame = series.write_frame(0.5, k.grid, k.metrics, k.flow, {{"marker", 1, &marker}});
    EXPECT_EQ(frame.filename(), "fields_000000.vts");

    auto reader = vtkSmartPointer<vtkXMLStructuredGridReader>::New();
    reader->SetFileName(frame.c_str());
    reader->Update();
    vtkCellData* cd = reader->GetOutput()->GetCellData();
    for (const char* name : {"velocity", "pressure", "Cp", "vorticity", "eddy_viscosity", "marker"})
        ASSERT_TRUE(cd->GetArray(name)) << name;
    EXPECT_FALSE(cd->GetArray("nu_tilde"));  // the flow holds none (laminar)
    EXPECT_EQ(cd->GetArray("velocity")->GetNumberOfComponents(), 3);
    const std::vector<double> vorticity = compute_vorticity(k.grid, k.metrics, k.flow);
    // Float64 binary: values come back exactly, and Cp = 2 (p - p_inf) is exact in binary.
    for (vtkIdType c = 0; c < 24; ++c) {
        const auto n = static_cast<std::size_t>(c);
        EXPECT_EQ(cd->GetArray("velocity")->GetComponent(c, 0), k.flow.u[n]);
        EXPECT_EQ(cd->GetArray("velocity")->GetComponent(c, 1), k.flow.v[n]);
        EXPECT_EQ(cd->GetArray("velocity")->GetComponent(c, 2), 0.0);
        EXPECT_EQ(cd->GetArray("pressure")->GetComponent(c, 0), k.flow.pressure[n]);
        EXPECT_EQ(cd->GetArray("Cp")->GetComponent(c, 0), 2.0 * k.flow.pressure[n]);
        EXPECT_EQ(cd->GetArray("vorticity")->GetComponent(c, 0), vorticity[n]);
        EXPECT_EQ(cd->GetArray("eddy_viscosity")->GetComponent(c, 0), k.flow.eddy_viscosity[n]);
    }
}

TEST(FieldSeries, PvdListsFramesInOrderWithExactTimes) {
    test::ScratchDir dir;
    Case k;
    FieldSeries series(dir.path(), SeriesStart::fresh);
    const double times[] = {0.1, 0.1 + 0.2, 1.0 / 3.0};
    for (double t : times) series.write_frame(t, k.grid, k.metrics, k.flow);
    const auto listed = read_pvd(dir / "fields.pvd");
    ASSERT_EQ(listed.size(), 3u);
    for (std::size_t f = 0; f < 3; ++f) {
        EXPECT_EQ(listed[f].time, times[f]);  // shortest round-trip text: exact
        EXPECT_EQ(listed[f].file, "fields_00000" + std::to_string(f) + ".vts");
        EXPECT_TRUE(std::filesystem::exists(dir / listed[f].file));
    }
    EXPECT_FALSE(std::filesystem::exists(dir / "fields.pvd.tmp"));
}

TEST(FieldSeries, RestartAppendsToTheExistingList) {
    test::ScratchDir dir;
    Case k;
    {
        FieldSeries first(dir.path(), SeriesStart::fresh);
        for (int f = 0; f < 3; ++f) first.write_frame(1.0 + f, k.grid, k.metrics, k.flow);
    }
    FieldSeries resumed(dir.path(), SeriesStart::resume);
    ASSERT_EQ(resumed.frames().size(), 3u);
    resumed.write_frame(4.0, k.grid, k.metrics, k.flow);
    resumed.write_frame(5.0, k.grid, k.metrics, k.flow);
    const auto listed = read_pvd(dir / "fields.pvd");
    ASSERT_EQ(listed.size(), 5u);
    for (std::size_t f = 0; f < 5; ++f) {
        EXPECT_EQ(listed[f].time, 1.0 + static_cast<double>(f));
        EXPECT_EQ(listed[f].file, "fields_00000" + std::to_string(f) + ".vts");
    }
}

TEST(FieldSeries, RestartFromAnEarlierCheckpointDropsLaterFrames) {
    test::ScratchDir dir;
    Case k;
    {
        FieldSeries first(dir.path(), SeriesStart::fresh);
        for (int f = 0; f < 4; ++f) first.write_frame(10.0 * f, k.grid, k.metrics, k.flow);
    }
    FieldSeries resumed(dir.path(), SeriesStart::resume);
    resumed.discard_after(15.0);  // the checkpoint was at t = 15: frames at 20 and 30 are stale
    resumed.write_frame(25.0, k.grid, k.metrics, k.flow);
    const auto listed = read_pvd(dir / "fields.pvd");
    ASSERT_EQ(listed.size(), 3u);
    EXPECT_EQ(listed[2].time, 25.0);
    EXPECT_EQ(listed[2].file, "fields_000002.vts");  // overwrites the stale frame's file
    // A frame at an earlier time than the last listed one also keeps the list increasing.
    resumed.write_frame(5.0, k.grid, k.metrics, k.flow);
    const auto again = read_pvd(dir / "fields.pvd");
    ASSERT_EQ(again.size(), 2u);
    EXPECT_EQ(again[0].time, 0.0);
    EXPECT_EQ(again[1].time, 5.0);
}

TEST(FieldSeries, FreshStartReplacesAnOldList) {
    test::ScratchDir dir;
    Case k;
    {
        FieldSeries old(dir.path(), SeriesStart::fresh);
        old.write_frame(1.0, k.grid, k.metrics, k.flow);
        old.write_frame(2.0, k.grid, k.metrics, k.flow);
    }
    FieldSeries fresh(dir.path(), SeriesStart::fresh);
    EXPECT_TRUE(fresh.frames().empty());
    fresh.write_frame(0.5, k.grid, k.metrics, k.flow);
    ASSERT_EQ(read_pvd(dir / "fields.pvd").size(), 1u);
}

TEST(FieldSeries, FreshStartRemovesOnlyTheOldSeriesOwnFrames) {
    // --force or a rerun into the same folder: three old frames (one written by a run killed
    // before it listed it) go, so a viewer cannot mix two runs; the user's files stay.
    test::ScratchDir dir;
    Case k;
    {
        FieldSeries old(dir.path(), SeriesStart::fresh);
        for (double t : {1.0, 2.0}) old.write_frame(t, k.grid, k.metrics, k.flow);
    }
    std::filesystem::copy_file(dir / "fields_000001.vts", dir / "fields_000002.vts");
    std::ofstream(dir / "fields_final.vts") << "the user's";
    std::ofstream(dir / "notes.txt") << "the user's";
    FieldSeries fresh(dir.path(), SeriesStart::fresh);
    for (const char* gone : {"fields_000000.vts", "fields_000001.vts", "fields_000002.vts"})
        EXPECT_FALSE(std::filesystem::exists(dir / gone)) << gone;
    EXPECT_TRUE(std::filesystem::exists(dir / "fields_final.vts"));
    EXPECT_TRUE(std::filesystem::exists(dir / "notes.txt"));
    fresh.write_frame(0.5, k.grid, k.metrics, k.flow);
    EXPECT_TRUE(std::filesystem::exists(dir / "fields_000000.vts"));
    EXPECT_FALSE(std::filesystem::exists(dir / "fields_000001.vts"));
}

TEST(FieldSeries, FreshStartLeavesFilesAloneWhenTheOldListIsNotVeers) {
    test::ScratchDir dir;
    std::ofstream(dir / "fields.pvd") << "a user's notes, not a frame list\n";
    std::ofstream(dir / "fields_000003.vts") << "the user's";
    const FieldSeries fresh(dir.path(), SeriesStart::fresh);
    EXPECT_TRUE(std::filesystem::exists(dir / "fields_000003.vts"));
    EXPECT_TRUE(std::filesystem::exists(dir / "fields.pvd"));
}

TEST(FieldSeries, ForeignListIsRefusedWithItsName) {
    test::ScratchDir dir;
    std::ofstream(dir / "fields.pvd") << "frame 1 at t = 0.5\n";
    try {
        FieldSeries s(dir.path(), SeriesStart::resume);
        FAIL() << "expected an InputError";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("fields.pvd: not a VTK collection file"),
                  std::string::npos)
            << e.what();
    }
    std::ofstream(dir / "fields.pvd")
        << "<VTKFile><Collection><DataSet timestep=\"soon\" file=\"a.vts\"/></Collection>";
    EXPECT_THROW(FieldSeries(dir.path(), SeriesStart::resume), InputError);
}

}  // namespace
}  // namespace veer
