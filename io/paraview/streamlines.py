"""Streamlines about a veer section with ParaView's batch renderer.

Reads the last frame listed in DIR/fields.pvd, seeds streamlines on a vertical line upstream of
the section, colours them (and the field behind them) by speed or Cp, and writes a PNG.

    xvfb-run -a pvbatch io/paraview/streamlines.py RUN_DIR [--colour speed|Cp] [-o picture.png]

Debian's ParaView renders through X only, hence xvfb-run (see app/SWEEPS.md for installing
ParaView beside VTK's development files).
"""
import argparse
import os
import sys

from paraview import simple as pv


def parse_arguments():
    p = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    p.add_argument("run_dir", help="a veer run folder holding fields.pvd")
    p.add_argument("--colour", choices=["speed", "Cp"], default="speed")
    p.add_argument("-o", "--output", help="PNG to write (default RUN_DIR/streamlines_paraview.png)")
    p.add_argument("--seeds", type=int, default=60, help="number of streamlines")
    p.add_argument("--width", type=int, default=1400)
    p.add_argument("--height", type=int, default=700)
    return p.parse_args()


def last_frame(reader):
    times = list(reader.TimestepValues) if reader.TimestepValues else []
    return times[-1] if times else None


def seed_line(tracer, x, y0, y1, count):
    # ParaView 5.10+ names the line seed "Line"; older releases call it by its longer name.
    for name in ("Line", "High Resolution Line Source"):
        try:
            tracer.SeedType = name
            break
        except (ValueError, AttributeError):
            continue
    tracer.SeedType.Point1 = [x, y0, 0.0]
    tracer.SeedType.Point2 = [x, y1, 0.0]
    tracer.SeedType.Resolution = count


def main():
    a = parse_arguments()
    pvd = os.path.join(a.run_dir, "fields.pvd")
    if not os.path.exists(pvd):
        sys.exit(f"streamlines.py: {pvd}: no such file (run veer run or veer sweep first)")
    out = a.output or os.path.join(a.run_dir, "streamlines_paraview.png")

    reader = pv.PVDReader(FileName=pvd)
    t = last_frame(reader)
    # Cell data (velocity, Cp) to point data: the stream tracer integrates point vectors.
    points = pv.CellDatatoPointData(Input=reader)
    speed = pv.Calculator(Input=points, ResultArrayName="speed", Function="mag(velocity)")
    tracer = pv.StreamTracer(Input=speed, Vectors=["POINTS", "velocity"])
    seed_line(tracer, -0.5, -0.5, 0.5, a.seeds)
    tracer.MaximumStreamlineLength = 6.0
    tracer.IntegrationDirection = "FORWARD"

    view = pv.GetActiveViewOrCreate("RenderView")
    view.ViewSize = [a.width, a.height]
    view.OrientationAxesVisibility = 0
    if t is not None:
        view.ViewTime = t
    field = pv.Show(speed, view)
    pv.ColorBy(field, ("POINTS", a.colour))
    field.SetScalarBarVisibility(view, True)
    lines = pv.Show(tracer, view)
    pv.ColorBy(lines, None)
    lines.AmbientColor = lines.DiffuseColor = [1.0, 1.0, 1.0]
    lines.LineWidth = 1.5
    # The first render places the camera around the whole grid; then it is moved to the near
    # field (-0.6 to 1.9 chords across), where the section is the hole in the grid.
    pv.Render(view)
    view.CameraPosition = [0.65, 0.0, 5.0]
    view.CameraFocalPoint = [0.65, 0.0, 0.0]
    view.CameraViewUp = [0.0, 1.0, 0.0]
    view.CameraParallelProjection = 1
    view.CameraParallelScale = 0.65
    pv.Render(view)
    pv.SaveScreenshot(out, view, ImageResolution=[a.width, a.height])
    print(f"streamlines.py: wrote {out}" + (f" (t = {t:g})" if t is not None else ""))


if __name__ == "__main__":
    main()
