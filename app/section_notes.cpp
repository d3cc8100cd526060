#include "app/section_notes.hpp"

#include <fmt/format.h>

#include <algorithm>

#include "mesh/chord_frame.hpp"
#include "mesh/trailing_edge.hpp"

namespace veer {
namespace {

std::string point_text(Vec2 p) { return fmt::format("({:.6g}, {:.6g})", p.x, p.y); }

const char* chord_line_word(SectionFrame::Origin o) {
    switch (o) {
        case SectionFrame::Origin::analytic:
            return "analytic";
        case SectionFrame::Origin::file_axes:
            return "file-axes";
        case SectionFrame::Origin::nose_to_tail:
            return "nose-to-tail";
    }
    return "?";
}

const char* choice_word(ChordLineChoice c) {
    switch (c) {
        case ChordLineChoice::automatic:
            return "auto";
        case ChordLineChoice::file_axes:
            return "file-axes";
        case ChordLineChoice::nose_to_tail:
            return "nose-to-tail";
    }
    return "?";
}

const char* closure_word(TrailingEdgeClosure::Form f) {
    switch (f) {
        case TrailingEdgeClosure::Form::sharp:
            return "sharp";
        case TrailingEdgeClosure::Form::wedge:
            return "wedge";
        case TrailingEdgeClosure::Form::fairing:
            return "fairing";
    }
    return "?";
}

std::string layout_text(const Section& s) {
    if (s.layout.empty()) return {};
    std::vector<int> lines;
    for (int l : s.lines)
        if (l > 0) lines.push_back(l);
    const auto [lo, hi] = std::minmax_element(lines.begin(), lines.end());
    // the outline runs lower surface first; a file listed upper first was reversed
    return fmt::format("{}; {} points used (file lines {} to {})", s.layout, lines.size(),
                       lines.empty() ? 0 : *lo, lines.empty() ? 0 : *hi);
}

std::string rotation_text(double deg) {
    if (deg == 0.0) return "rotation 0 deg";
    return fmt::format("rotation {:+.4f} deg (the file's chord line pointed {:.4f} deg nose-{})",
                       deg, std::abs(deg), deg > 0.0 ? "up" : "down");
}

std::string chord_line_text(const SectionFrame& f) {
    switch (f.origin) {
        case SectionFrame::Origin::analytic:
            return "the formula's own, (0, 0) to (1, 0); scale 1, rotation 0 deg: nothing moved";
        case SectionFrame::Origin::file_axes:
            return fmt::format(
                "the file's own x axis, (0, 0) to (1, 0) as written; scale 1, rotation 0 deg "
                "(trailing-edge centre found at {}, foremost point at {})",
                point_text(f.found_trailing_edge), point_text(f.found_foremost));
        case SectionFrame::Origin::nose_to_tail:
            break;
    }
    const std::string why =
        f.choice == ChordLineChoice::automatic
            ? fmt::format(
                  "the file is not in chord units (trailing-edge centre at {}, foremost "
                  "point at {}; within {} of (1, 0) and x = 0 keeps the file's axes)",
                  point_text(f.found_trailing_edge), point_text(f.found_foremost),
                  ChordFrameLimits::automatic_fit)
            : std::string("as chord_line = \"nose-to-tail\" asks");
    return fmt::format(
        "placed by veer, {}: from the nose point {} to the trailing-edge centre {}; scale {:.6g} "
        "chords per file unit, {}; angles of attack are measured from this line",
        why, point_text(f.leading_edge), point_text(f.trailing_edge), f.scale,
        rotation_text(f.rotation_deg));
}

std::string trailing_edge_text(const TrailingEdgeClosure& c) {
    std::string text;
    switch (c.form) {
        case TrailingEdgeClosure::Form::sharp:
            text = "sharp";
            break;
        case TrailingEdgeClosure::Form::wedge:
            text = fmt::format(
                "blunt, gap {:.3g}% chord, closed by a wedge (the surfaces continued straight) "
                "with its tip {:.3g} chords behind the trailing-edge centre",
                100.0 * c.gap, c.length);
            break;
        case TrailingEdgeClosure::Form::fairing:
            text = fmt::format(
                "blunt, gap {:.3g}% chord, closed by a fairing (each surface continued smoothly "
                "to a tip of {:g} deg half-angle) {:.3g} chords long; forces stay referred to the "
                "chord line",
                100.0 * c.gap, TrailingEdgeLimits::fairing_half_angle_degrees, c.length);
            break;
    }
    if (c.base_points_set_aside > 0)
        text += fmt::format(
            "; {} point{} that only drew the base (a repeated closing point or a "
            "segment across the gap) set aside",
            c.base_points_set_aside, c.base_points_set_aside > 1 ? "s" : "");
    return text;
}

}  // namespace

SectionNotes section_notes(const Section& s) {
    return {layout_text(s), chord_line_text(s.frame), trailing_edge_text(s.closure)};
}

nlohmann::json section_placement_json(const Section& s) {
    const SectionNotes n = section_notes(s);
    const SectionFrame& f = s.frame;
    return {
        {"layout", s.layout},
        {"chord_line", chord_line_word(f.origin)},
        {"chord_line_requested", choice_word(f.choice)},
        {"chord_line_start", {f.leading_edge.x, f.leading_edge.y}},
        {"chord_line_end", {f.trailing_edge.x, f.trailing_edge.y}},
        {"scale", f.scale},
        {"rotation_deg", f.rotation_deg},
        {"trailing_edge_gap", s.closure.gap},
        {"trailing_edge_closure", closure_word(s.closure.form)},
        {"trailing_edge_tip_distance", s.closure.length},
        {"base_points_set_aside", s.closure.base_points_set_aside},
        {"notes", nlohmann::json::array({n.layout, n.chord_line, n.trailing_edge})},
    };
}

void print_section_notes(const Section& s, int label_width) {
    const SectionNotes n = section_notes(s);
    const auto line = [label_width](const char* label, const std::string& text) {
        if (!text.empty()) fmt::print("  {:<{}}{}\n", label, label_width, text);
    };
    line("layout", n.layout);
    line("chord line", n.chord_line);
    line("trailing edge", n.trailing_edge);
}

}  // namespace veer
