#include "io/plot_frame.hpp"

#include <vtkCellData.h>
#include <vtkDataArray.h>
#include <vtkNew.h>
#include <vtkPoints.h>
#include <vtkStructuredGrid.h>
#include <vtkXMLStructuredGridReader.h>

#include "io/field_series.hpp"
#include "mesh/errors.hpp"

namespace veer {

FlowFrame read_flow_frame(const std::filesystem::path& vts) {
    std::error_code ec;
    if (!std::filesystem::exists(vts, ec)) throw InputError(vts.string() + ": no such frame");
    vtkNew<vtkXMLStructuredGridReader> reader;
    reader->SetFileName(vts.c_str());
    reader->Update();
    vtkStructuredGrid* g = reader->GetOutput();
    int dims[3] = {0, 0, 0};
    if (g) g->GetDimensions(dims);
    if (!g || dims[0] < 2 || dims[1] < 2 || !g->GetPoints())
        throw InputError(vts.string() + ": not a structured grid frame of veer");
    vtkDataArray* velocity = g->GetCellData()->GetArray("velocity");
    vtkDataArray* cp = g->GetCellData()->GetArray("Cp");
    if (!velocity || !cp || velocity->GetNumberOfComponents() < 2)
        throw InputError(vts.string() + ": the frame lacks the cell arrays velocity and Cp");
    FlowFrame f;
    f.ni = dims[0] - 1;
    f.nj = dims[1] - 1;
    const vtkIdType points = g->GetNumberOfPoints();
    for (vtkIdType p = 0; p < points; ++p) {
        double x[3];
        g->GetPoint(p, x);
        f.node_x.push_back(x[0]);
        f.node_y.push_back(x[1]);
    }
    const vtkIdType cells = static_cast<vtkIdType>(f.ni) * f.nj;
    if (velocity->GetNumberOfTuples() != cells || cp->GetNumberOfTuples() != cells)
        throw InputError(vts.string() + ": cell arrays do not match the grid");
    for (vtkIdType c = 0; c < cells; ++c) {
        f.u.push_back(velocity->GetComponent(c, 0));
        f.v.push_back(velocity->GetComponent(c, 1));
        f.cp.push_back(cp->GetComponent(c, 0));
    }
    return f;
}

std::filesystem::path last_frame_file(const std::filesystem::path& pvd) {
    const std::vector<SeriesFrame> frames = read_pvd(pvd);
    if (frames.empty()) throw InputError(pvd.string() + ": lists no frame");
    return pvd.parent_path() / frames.back().file;
}

}  // namespace veer
