#include "io/case_file.hpp"

#include <fmt/format.h>
#include <toml++/toml.h>

#include <algorithm>
#include <cctype>
#include <fstream>
#include <set>
#include <sstream>

#include "io/case_choices.hpp"
#include "io/input_file.hpp"
#include "mesh/errors.hpp"
#include "solver/model_registry.hpp"

namespace veer {
namespace {

/// Reads typed values from one table of the case and remembers which keys were used, so that
/// anything left over can be reported as unknown.
class TableReader {
public:
    TableReader(const toml::table* table, std::string table_name, std::string source)
        : m_table(table), m_name(std::move(table_name)), m_source(std::move(source)) {}

    bool has(const std::string& key) const { return m_table && m_table->contains(key); }

    std::optional<double> number(const std::string& key, double lo, double hi,
                                 const std::string& allowed) {
        const toml::node* n = find(key);
        if (!n) return std::nullopt;
        std::optional<double> v;
        if (n->is_floating_point()) v = n->as_floating_point()->get();
        if (n->is_integer()) v = static_cast<double>(n->as_integer()->get());
        if (!v) fail(*n, key, describe(*n), "a number, " + allowed);
        if (!(*v >= lo && *v <= hi)) fail(*n, key, fmt::format("{}", *v), allowed);
        return v;
    }

    std::optional<long> integer(const std::string& key, long lo, long hi,
                                const std::string& allowed) {
        const toml::node* n = find(key);
        if (!n) return std::nullopt;
        if (!n->is_integer()) fail(*n, key, describe(*n), "an integer, " + allowed);
        const auto v = static_cast<long>(n->as_integer()->get());
        if (v < lo || v > hi) fail(*n, key, std::to_string(v), allowed);
        return v;
    }

    std::optional<bool> flag(const std::string& key, const std::string& allowed) {
        const toml::node* n = find(key);
        if (!n) return std::nullopt;
        if (!n->is_boolean()) fail(*n, key, describe(*n), allowed);
        return n->as_boolean()->get();
    }

    std::optional<std::string> text(const std::string& key, const std::set<std::string>& choices,
                                    const std::string& allowed) {
        const toml::node* n = find(key);
        if (!n) return std::nullopt;
        if (!n->is_string()) fail(*n, key, describe(*n), "a string, " + allowed);
        std::string v = n->as_string()->get();
        if (!choices.empty() && !choices.count(v)) fail(*n, key, "\"" + v + "\"", allowed);
        return v;
    }

    /// The word a choice key holds (io/case_choices.hpp), checked against the key's words.
    std::optional<std::string> choice(const std::string& table, const std::string& key) {
        const std::vector<std::string> words = choice_words(table, key);
        VEER_VERIFY(!words.empty(), "[" + table + "] " + key + " is not a choice key");
        return text(key, {words.begin(), words.end()}, quoted_choices(words));
    }

    std::optional<std::vector<double>> numbers(const std::string& key, double lo, double hi,
                                               const std::string& allowed) {
        const toml::node* n = find(key);
        if (!n) return std::nullopt;
        const toml::array* a = n->as_array();
        if (!a || a->empty())
            fail(*n, key, describe(*n), "a non-empty list of numbers, " + allowed);
        std::vector<double> out;
        for (const toml::node& e : *a) {
            std::optional<double> v;
            if (e.is_floating_point()) v = e.as_floating_point()->get();
            if (e.is_integer()) v = static_cast<double>(e.as_integer()->get());
            if (!v || !(*v >= lo && *v <= hi)) fail(e, key, describe(e), allowed);
            out.push_back(*v);
        }
        return out;
    }

    /// Fails on the first key of the table that no reader asked for.
    void reject_unknown(const std::string& allowed_keys) const {
        if (!m_table) return;
        for (auto&& [k, v] : *m_table)
            if (!m_used.count(std::string(k.str())))
                throw InputError(fmt::format("{}: [{}] unknown key '{}'; allowed keys: {}",
                                             where(v), m_name, k.str(), allowed_keys));
    }

    [[noreturn]] void fail(const toml::node& n, const std::string& key, const std::string& found,
                           const std::string& allowed) const {
        throw InputError(
            fmt::format("{}: [{}] {} = {}: expected {}", where(n), m_name, key, found, allowed));
    }

    std::string where(const toml::node& n) const {
        const auto line = n.source().begin.line;
        return line > 0 ? fmt::format("{}:{}", m_source, line) : m_source + " (command line)";
    }

private:
    const toml::node* find(const std::string& key) {
        m_used.insert(key);
        return m_table ? m_table->get(key) : nullptr;
    }

    static std::string describe(const toml::node& n) {
        std::ostringstream s;
        if (n.is_string())
            s << '"' << n.as_string()->get() << '"';
        else if (n.is_table())
            s << "a table";
        else if (n.is_array())
            s << "a list";
        else
            n.visit([&](auto&& v) { s << v; });
        return s.str();
    }

    const toml::table* m_table;
    std::string m_name;
    std::string m_source;
    std::set<std::string> m_used;
};

using fs_path = std::filesystem::path;

std::string p_stem(const fs_path& p) { return p.stem().string(); }

const toml::table* sub_table(const toml::table& root, const std::string& name,
                             const std::string& source) {
    const toml::node* n = root.get(name);
    if (!n) return nullptr;
    if (!n->is_table())
        throw InputError(fmt::format("{}:{}: '{}' must be a table [{}]", source,
                                     n->source().begin.line, name, name));
    return n->as_table();
}

void read_geometry(const toml::table* t, const std::string& source, const fs_path& base,
                   FileCheck files, CaseSpec& c) {
    TableReader r(t, "geometry", source);
    const auto naca = r.text("naca", {}, "four or five digits, e.g. \"0012\" or \"23012\"");
    const auto file = r.text("coordinates", {}, "the path of a two-column x y file");
    const auto te = r.choice("geometry", "trailing_edge");
    const auto circle = r.flag("circle", "true (a circular cylinder of diameter 1)");
    const auto name = r.text("name", {}, "a label");
    const auto chord = r.choice("geometry", "chord_line");
    r.reject_unknown("naca, coordinates, circle, trailing_edge, chord_line, name");
    if (circle && !*circle)
        r.fail(*t->get("circle"), "circle", "false",
               "true, or leave the key out and give naca or coordinates");
    if (naca.has_value() + file.has_value() + circle.has_value() != 1)
        throw InputError(source +
                         ": [geometry] needs exactly one of naca = \"0012\", "
                         "coordinates = \"file.dat\" or circle = true");
    if (circle) {
        if (te)
            r.fail(*t->get("trailing_edge"), "trailing_edge", "\"" + *te + "\"",
                   "no trailing_edge with circle = true (a circle has none)");
        if (chord)
            r.fail(*t->get("chord_line"), "chord_line", "\"" + *chord + "\"",
                   "no chord_line with circle = true (the diameter along the free stream is the "
                   "reference line)");
        c.geometry.circle = true;
        c.geometry.name = name ? *name : "circle";
        return;
    }
    if (naca) {
        const bool digits = std::all_of(naca->begin(), naca->end(), [](char ch) {
            return std::isdigit(static_cast<unsigned char>(ch)) != 0;
        });
        if (!digits || (naca->size() != 4 && naca->size() != 5))
            r.fail(*t->get("naca"), "naca", "\"" + *naca + "\"",
                   "four digits (e.g. \"2412\") or five digits (e.g. \"23012\")");
        c.geometry.naca = *naca;
    } else {
        fs_path p(*file);
        if (p.is_relative()) p = base / p;
        if (files == FileCheck::require && !std::filesystem::exists(p))
            r.fail(*t->get("coordinates"), "coordinates", "\"" + *file + "\"",
                   "an existing file (looked for " + p.string() + ")");
        c.geometry.coordinates = p;
    }
    if (te && !naca)
        r.fail(*t->get("trailing_edge"), "trailing_edge", "\"" + *te + "\"",
               "trailing_edge only with naca (a coordinate file's trailing edge is closed by "
               "veer)");
    if (te) c.geometry.trailing_edge = trailing_edge_of(*te);
    if (chord && naca)
        r.fail(*t->get("chord_line"), "chord_line", "\"" + *chord + "\"",
               "chord_line only with coordinates (a NACA section keeps its analytic chord line)");
    if (chord) c.geometry.chord_line = chord_line_of(*chord);
    c.geometry.name = name ? *name : (naca ? "NACA " + *naca : p_stem(c.geometry.coordinates));
}

void read_mesh(const toml::table* t, const std::string& source, CaseSpec& c) {
    TableReader r(t, "mesh", source);
    CGridSpec& m = c.mesh;
    m.around = static_cast<int>(
        r.integer("around", 16, 8192, "an even integer from 16 to 8192").value_or(m.around));
    if (m.around % 2 != 0)
        r.fail(*t->get("around"), "around", std::to_string(m.around),
               "an even integer from 16 to 8192 (the leading edge sits on a grid line)");
    m.normal = static_cast<int>(
        r.integer("normal", 4, 4096, "an integer from 4 to 4096").value_or(m.normal));
    const auto wake = r.integer("wake", 2, 4096, "an integer from 2 to 4096");
    m.wake = wake ? static_cast<int>(*wake) : std::max(2, 3 * m.around / 16);
    if (c.geometry.circle && r.has("wake"))
        r.fail(*t->get("wake"), "wake", std::to_string(*wake),
               "no wake key with circle = true (its O-grid has no wake cut)");
    m.far_field = r.number("far_field", 2.0, 1000.0, "a distance from 2 to 1000 chords")
                      .value_or(m.far_field);
    const auto first = r.number("first_cell", 1e-9, 0.1, "a height from 1e-9 to 0.1 chords");
    c.y_plus = r.number("y_plus", 0.01, 500.0, "a wall-unit target from 0.01 to 500");
    m.max_growth =
        r.number("max_growth", 1.01, 2.0, "a ratio from 1.01 to 2").value_or(m.max_growth);
    m.surface_slope = r.number("surface_slope", 0.01, 2.0, "a growth rate from 0.01 to 2")
                          .value_or(m.surface_slope);
    if (c.geometry.circle && r.has("surface_slope"))
        r.fail(*t->get("surface_slope"), "surface_slope", std::to_string(m.surface_slope),
               "no surface_slope key with circle = true (its wall nodes lie at equal angles)");
    r.reject_unknown(
        "around, normal, wake, far_field, first_cell, y_plus, max_growth, surface_slope");
    if (first && c.y_plus)
        throw InputError(source + ": [mesh] give first_cell or y_plus, not both");
    if (first) m.first_cell = *first;
}

void read_flow(const toml::table* t, const std::string& source, CaseSpec& c) {
    TableReader r(t, "flow", source);
    const auto re = r.number("reynolds", 1.0, 1e9, "a Reynolds number from 1 to 1e9");
    if (!re) throw InputError(source + ": [flow] reynolds is required (e.g. reynolds = 1000)");
    c.flow.reynolds = *re;
    c.flow.alpha_deg =
        r.number("alpha", -90.0, 90.0, "an angle of attack from -90 to 90 degrees").value_or(0.0);
    if (c.geometry.circle && c.flow.alpha_deg != 0.0)
        r.fail(*t->get("alpha"), "alpha", fmt::format("{}", c.flow.alpha_deg),
               "0 with circle = true (a circle has no angle of attack: the flow runs along +x)");
    if (const auto model = r.choice("flow", "model")) c.model = model_named(*model);
    std::string known = "reynolds, alpha, model";
    for (const ModelKey& k : c.model.keys) {
        if (const auto v = r.number(k.name, k.lowest, k.highest, k.allowed))
            c.model.options[k.name] = *v;
        known += ", " + k.name;
    }
    r.reject_unknown(known);
    if (c.model.check_options) {
        try {
            c.model.check_options(c.model.options);
        } catch (const InputError& e) {
            throw InputError(source + ": " + e.what());
        }
    }
}

void read_run(const toml::table* t, const std::string& source, CaseSpec& c) {
    TableReader r(t, "run", source);
    RunSpec& run = c.run;
    if (const auto mode = r.choice("run", "mode")) run.mode = mode_of(*mode);
    run.steps =
        r.integer("steps", 1, 100000000, "an iteration cap from 1 to 1e8").value_or(run.steps);
    run.end_time = r.number("end_time", 1e-6, 1e6, "a time from 1e-6 to 1e6 (chord / speed)")
                       .value_or(run.end_time);
    run.cfl =
        r.number("cfl", 0.0, 1000.0, "a CFL target from 0 (default) to 1000").value_or(run.cfl);
    run.residual_drop = r.number("residual_drop", 1e-14, 0.1, "a factor from 1e-14 to 0.1")
                            .value_or(run.residual_drop);
    run.force_tolerance = r.number("force_tolerance", 1e-12, 0.1, "a change from 1e-12 to 0.1")
                              .value_or(run.force_tolerance);
    if (const auto estimate = r.flag("settle_estimate", "true or false"))
        run.settle_estimate = *estimate;
    run.output_every =
        r.integer("output_every", 0, 100000000, "a step interval (0: first and last)")
            .value_or(run.output_every);
    run.checkpoint_every = r.integer("checkpoint_every", 1, 100000000, "a step interval from 1")
                               .value_or(run.checkpoint_every);
    if (const auto solver = r.choice("run", "pressure_solver"))
        run.pressure_solver = pressure_solver_of(*solver);
    if (const auto scheme = r.choice("run", "steady_scheme"))
        run.steady_scheme = steady_scheme_of(*scheme);
    const auto spin = r.number("start_spin", 0.0, 2.0, "a surface speed from 0 to 2");
    r.reject_unknown(
        "mode, steps, end_time, cfl, residual_drop, force_tolerance, settle_estimate, "
        "output_every, checkpoint_every, pressure_solver, steady_scheme, start_spin");
    if (spin && *spin > 0.0 && !c.geometry.circle)
        r.fail(*t->get("start_spin"), "start_spin", fmt::format("{}", *spin),
               "0 unless [geometry] circle = true (only a circle can spin in place)");
    if (spin && *spin > 0.0 && run.mode != TimeMode::time_accurate)
        r.fail(*t->get("start_spin"), "start_spin", fmt::format("{}", *spin),
               "0 unless mode = \"unsteady\" (the spin starts a time-accurate run)");
    run.start_spin = spin.value_or(0.0);
    // Steady runs smooth the pressure with a coefficient that needs a pseudo CFL number above
    // rhie_chow_scale / (2 x the scheme's projection fraction) (solver/README.md, "Projection",
    // "Steady schemes"); the solver refuses smaller ones, so `check` refuses them too.
    const double fraction = steady_scheme_choices(run.steady_scheme, 1.0).projection_fraction;
    const double smallest = 0.5 * SolverSettings{}.rhie_chow_scale / fraction;
    if (run.mode == TimeMode::steady && run.cfl > 0.0 && run.cfl <= smallest)
        r.fail(*t->get("cfl"), "cfl", fmt::format("{}", run.cfl),
               fmt::format("0 (the default) or above {:.3g} in steady mode with steady_scheme "
                           "\"{}\" (the pressure smoothing of the steady iteration needs it)",
                           smallest, steady_scheme_word(run.steady_scheme)));
}

void read_post(const toml::table* t, const std::string& source, CaseSpec& c) {
    TableReader r(t, "post", source);
    c.post.contours = r.numbers("contours", 0.01, 1000.0, "distances from 0.01 to 1000 chords")
                          .value_or(c.post.contours);
    c.post.wake_stations = r.numbers("wake_stations", 0.01, 1000.0,
                                     "distances from 0.01 to 1000 chords behind the "
                                     "trailing edge")
                               .value_or(c.post.wake_stations);
    r.reject_unknown("contours, wake_stations");
    for (double d : c.post.contours)
        if (d >= c.mesh.far_field)
            throw InputError(
                fmt::format("{}: [post] contours: {} chords lies outside the grid "
                            "(far_field = {})",
                            source, d, c.mesh.far_field));
}

/// Applies "table.key=value" overrides to the parsed document.
void apply_overrides(toml::table& root, const std::vector<std::string>& overrides) {
    for (const std::string& o : overrides) {
        const auto eq = o.find('=');
        const auto dot = o.find('.');
        if (eq == std::string::npos || dot == std::string::npos || dot > eq)
            throw InputError("--set " + o + ": expected table.key=value, e.g. flow.alpha=6");
        const std::string table = o.substr(0, dot), key = o.substr(dot + 1, eq - dot - 1);
        toml::table parsed;
        try {
            parsed = toml::parse("v = " + o.substr(eq + 1));
        } catch (const toml::parse_error&) {
            // A bare word is taken as a string: --set flow.model=laminar.
            parsed = toml::table{{"v", o.substr(eq + 1)}};
        }
        if (!root.contains(table)) root.insert(table, toml::table{});
        toml::table* t = root.get(table)->as_table();
        if (!t) throw InputError(fmt::format("--set {}: '{}' is not a table", o, table));
        t->insert_or_assign(key, *parsed.get("v"));
    }
}

}  // namespace

CaseSpec parse_case_text(const std::string& text, const std::string& source,
                         const std::filesystem::path& base_dir,
                         const std::vector<std::string>& overrides, FileCheck files) {
    toml::table root;
    try {
        root = toml::parse(text, source);
    } catch (const toml::parse_error& e) {
        throw InputError(fmt::format("{}:{}: not valid TOML: {}", source, e.source().begin.line,
                                     e.description()));
    }
    apply_overrides(root, overrides);
    for (auto&& [k, v] : root) {
        static const std::set<std::string> tables = {"geometry", "mesh", "flow", "run", "post"};
        if (!tables.count(std::string(k.str())))
            throw InputError(
                fmt::format("{}:{}: unknown table or key '{}'; allowed tables: "
                            "[geometry], [mesh], [flow], [run], [post]",
                            source, v.source().begin.line, k.str()));
    }
    CaseSpec c;
    c.path = source;
    if (overrides.empty()) {
        c.text = text;
    } else {
        std::ostringstream s;
        s << root;
        c.text = s.str() + "\n";
    }
    const toml::table* geometry = sub_table(root, "geometry", source);
    if (!geometry) throw InputError(source + ": a [geometry] table is required");
    read_geometry(geometry, source, base_dir, files, c);
    read_mesh(sub_table(root, "mesh", source), source, c);
    const toml::table* flow = sub_table(root, "flow", source);
    if (!flow) throw InputError(source + ": a [flow] table is required (reynolds, alpha, model)");
    read_flow(flow, source, c);
    read_run(sub_table(root, "run", source), source, c);
    read_post(sub_table(root, "post", source), source, c);
    if (c.y_plus == std::nullopt && c.model.default_y_plus &&
        !(sub_table(root, "mesh", source) &&
          sub_table(root, "mesh", source)->contains("first_cell")))
        c.y_plus = c.model.default_y_plus;  // wall-resolved models: the first cell from y+
    return c;
}

CaseSource read_case_source(const std::filesystem::path& path) {
    std::string text = read_input_file(path, "case file", case_file_cap);
    // Files saved with old Mac line ends (a lone CR) read as one line otherwise; TOML wants LF.
    for (std::size_t at = 0; at < text.size(); ++at)
        if (text[at] == '\r' && (at + 1 == text.size() || text[at + 1] != '\n')) text[at] = '\n';
    return {path, std::move(text)};
}

CaseSpec parse_case_source(const CaseSource& source, const std::vector<std::string>& overrides) {
    CaseSpec c =
        parse_case_text(source.text, source.path.string(), source.path.parent_path(), overrides);
    c.path = source.path;
    return c;
}

CaseSpec read_case_file(const std::filesystem::path& path,
                        const std::vector<std::string>& overrides) {
    return parse_case_source(read_case_source(path), overrides);
}

}  // namespace veer
