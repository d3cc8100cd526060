#include "io/vtk_grid_writer.hpp"

#include <vtkCallbackCommand.h>
#include <vtkCellArray.h>
#include <vtkCellData.h>
#include <vtkCommand.h>
#include <vtkDoubleArray.h>
#include <vtkExecutive.h>
#include <vtkFieldData.h>
#include <vtkIdList.h>
#include <vtkNew.h>
#include <vtkPointData.h>
#include <vtkPoints.h>
#include <vtkPolyData.h>
#include <vtkSmartPointer.h>
#include <vtkStructuredGrid.h>
#include <vtkXMLPolyDataWriter.h>
#include <vtkXMLStructuredGridWriter.h>
#include <vtkXMLWriter.h>

#include <fstream>
#include <string>

#include "io/atomic_file.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;

namespace {

vtkSmartPointer<vtkDoubleArray> to_vtk_array(const DataArrayView& a, std::size_t count) {
    VEER_VERIFY(a.values != nullptr, "array '" + a.name + "' has no values");
    VEER_VERIFY(a.components >= 1 && a.components <= 3,
                "array '" + a.name + "' must have 1, 2 or 3 components");
    const auto comps = static_cast<std::size_t>(a.components);
    VEER_VERIFY(a.values->size() == count * comps,
                "array '" + a.name + "' has " + std::to_string(a.values->size()) +
                    " values; expected " + std::to_string(count * comps));
    auto out = vtkSmartPointer<vtkDoubleArray>::New();
    out->SetName(a.name.c_str());
    const int written = a.components == 1 ? 1 : 3;  // planar vectors gain z = 0
    out->SetNumberOfComponents(written);
    out->SetNumberOfTuples(static_cast<vtkIdType>(count));
    const std::vector<double>& v = *a.values;
    for (std::size_t n = 0; n < count; ++n) {
        const auto t = static_cast<vtkIdType>(n);
        if (a.components == 1) {
            out->SetValue(t, v[n]);
            continue;
        }
        for (std::size_t c = 0; c < 3; ++c)
            out->SetComponent(t, static_cast<int>(c), c < comps ? v[n * comps + c] : 0.0);
    }
    return out;
}

vtkSmartPointer<vtkPoints> to_vtk_points(const std::vector<Vec2>& points) {
    auto out = vtkSmartPointer<vtkPoints>::New();
    out->SetDataTypeToDouble();
    out->SetNumberOfPoints(static_cast<vtkIdType>(points.size()));
    for (std::size_t n = 0; n < points.size(); ++n)
        out->SetPoint(static_cast<vtkIdType>(n), points[n].x, points[n].y, 0.0);
    return out;
}

// VTK prints errors to the console unless someone observes them; a library must not print, so
// the messages are collected and the first becomes part of the exception, as one short clause:
// VTK's text is "ERROR: In FILE, line N\nCLASS (ADDRESS): WHAT\n" followed by a dump of the
// pipeline request, of which only WHAT means anything to the user.
struct ErrorCollector {
    std::string first;
    static void on_event(vtkObject*, unsigned long, void* self, void* call_data) {
        auto* me = static_cast<ErrorCollector*>(self);
        if (call_data == nullptr || !me->first.empty()) return;
        me->first = gist(static_cast<const char*>(call_data));
    }
    static std::string gist(std::string text) {
        const std::size_t line_end = text.find('\n');
        if (text.rfind("ERROR: In ", 0) == 0 || text.rfind("Warning: In ", 0) == 0)
            text = line_end == std::string::npos ? text : text.substr(line_end + 1);
        text = text.substr(0, text.find('\n'));
        const std::size_t colon = text.find("): ");  // after "CLASS (ADDRESS)"
        if (colon != std::string::npos) text = text.substr(colon + 3);
        text = text.substr(0, text.find(" for request"));  // the pipeline dump that follows
        for (std::size_t at; (at = text.find("(0x")) != std::string::npos;)  // object addresses
            text.erase(at, text.find(')', at) == std::string::npos ? std::string::npos
                                                                   : text.find(')', at) - at + 1);
        return text.substr(0, 160);
    }
};

// Appended raw binary, zlib, 64-bit headers: compact, fast, and safe for arrays over 4 GiB.
void write_with(vtkXMLWriter* writer, vtkDataObject* data, const fs::path& path) {
    ErrorCollector errors;
    vtkNew<vtkCallbackCommand> observer;
    observer->SetCallback(&ErrorCollector::on_event);
    observer->SetClientData(&errors);
    writer->AddObserver(vtkCommand::ErrorEvent, observer);
    writer->AddObserver(vtkCommand::WarningEvent, observer);
    writer->GetExecutive()->AddObserver(vtkCommand::ErrorEvent, observer);  // pipeline failures

    const fs::path tmp = temporary_path_for(path);
    if (!std::ofstream(tmp, std::ios::binary | std::ios::trunc))
        throw InputError(path.string() + ": cannot create " + tmp.string() +
                         " (missing folder or no write permission)");
    writer->SetFileName(tmp.c_str());
    writer->SetInputData(data);
    writer->SetDataModeToAppended();
    writer->EncodeAppendedDataOff();
    writer->SetHeaderTypeToUInt64();
    writer->SetIdTypeToInt64();
    writer->SetCompressorTypeToZLib();
    writer->SetCompressionLevel(1);  // doubles barely compress further; keep frames fast
    const int ok = writer->Write();
    if (ok != 1 || writer->GetErrorCode() != 0) {
        std::error_code ec;
        fs::remove(tmp, ec);
        throw InputError(path.string() + ": cannot write the VTK file (" +
                         (errors.first.empty() ? std::string("no reason given") : errors.first) +
                         "); is the disk full?");
    }
    commit_temporary(tmp, path);
}

}  // namespace

std::vector<double> interleave_xy0(const std::vector<double>& x, const std::vector<double>& y) {
    VEER_VERIFY(x.size() == y.size(), "vector components differ in length");
    std::vector<double> out(3 * x.size(), 0.0);
    for (std::size_t n = 0; n < x.size(); ++n) {
        out[3 * n] = x[n];
        out[3 * n + 1] = y[n];
    }
    return out;
}

void write_grid_vts(const fs::path& path, const StructuredGrid& grid,
                    const std::vector<CellArray>& cell_arrays,
                    const std::vector<PointArray>& point_arrays, std::optional<double> time) {
    vtkNew<vtkStructuredGrid> data;
    data->SetDimensions(grid.ni() + 1, grid.nj() + 1, 1);
    data->SetPoints(to_vtk_points(grid.nodes()));
    const auto cells = static_cast<std::size_t>(grid.cell_count());
    for (const CellArray& a : cell_arrays) data->GetCellData()->AddArray(to_vtk_array(a, cells));
    for (const PointArray& a : point_arrays)
        data->GetPointData()->AddArray(to_vtk_array(a, grid.nodes().size()));
    if (time) {
        vtkNew<vtkDoubleArray> t;
        t->SetName("TimeValue");  // the field-data name ParaView reads as the dataset's time
        t->InsertNextValue(*time);
        data->GetFieldData()->AddArray(t);
    }
    vtkNew<vtkXMLStructuredGridWriter> writer;
    write_with(writer, data, path);
}

void write_surface_vtp(const fs::path& path, const std::vector<Vec2>& points,
                       const std::vector<PointArray>& point_arrays,
                       const std::vector<std::size_t>& line_starts) {
    std::vector<std::size_t> starts =
        line_starts.empty() ? std::vector<std::size_t>{0} : line_starts;
    VEER_VERIFY(starts.front() == 0, "the first poly line must start at point 0");
    starts.push_back(points.size());
    vtkNew<vtkCellArray> lines;
    for (std::size_t l = 0; l + 1 < starts.size(); ++l) {
        VEER_VERIFY(starts[l + 1] >= starts[l] + 2, "each poly line needs at least two points");
        lines->InsertNextCell(static_cast<int>(starts[l + 1] - starts[l]));
        for (std::size_t n = starts[l]; n < starts[l + 1]; ++n)
            lines->InsertCellPoint(static_cast<vtkIdType>(n));
    }
    vtkNew<vtkPolyData> data;
    data->SetPoints(to_vtk_points(points));
    data->SetLines(lines);
    for (const PointArray& a : point_arrays)
        data->GetPointData()->AddArray(to_vtk_array(a, points.size()));
    vtkNew<vtkXMLPolyDataWriter> writer;
    write_with(writer, data, path);
}

}  // namespace veer
