#include "planner.h"

#include "focus.h"
#include "repository.h"
#include "status.h"
#include "wording.h"
#include "zonenames.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <glpk.h>
#include <numeric>
#include <stdexcept>

namespace pitchloop::model {

// Severity ---------------------------------------------------------------------------------

double normalisedGap(Direction direction, MetricKind kind, double value, double target) {
    if (std::isnan(value) || std::isnan(target)) return 0;
    double g = 0;
    if (direction == Direction::AtLeast) {
        if (value >= target || target <= 0) return 0;
        g = (target - value) / target;
    } else {
        if (value <= target) return 0;
        if (kind == MetricKind::Rate)
            g = target >= 1 ? 0 : (value - target) / (1 - target);
        else
            g = (value - target) / value;
    }
    return std::clamp(g, 0.0, 1.0);
}

double severity(Direction direction, MetricKind kind, double value, double target, double pMiss) {
    if (std::isnan(pMiss)) return 0;
    return std::clamp(pMiss, 0.0, 1.0) * normalisedGap(direction, kind, value, target);
}

int focusWeight(double s) {
    if (std::isnan(s)) return 0;
    return static_cast<int>(std::lround(100 * std::clamp(s, 0.0, 1.0)));
}

std::optional<PlanFocus> planFocus(const Focus& focus, const MetricSpec& metric,
                                   const std::vector<ZoneStatus>& statuses, const Window& window,
                                   const ZoneGrid& grid) {
    const bool whole = static_cast<int>(focus.zones.size()) == grid.zoneCount();
    std::optional<PlanFocus> best;
    for (const ZoneStatus& s : statuses) {
        if (s.metric != focus.metric || !(s.window == window) || !s.target) continue;
        const bool inFocus = (whole && s.band == 0 && s.lane == 0) ||
                             std::any_of(focus.zones.begin(), focus.zones.end(), [&](Zone z) {
                                 return z.band == s.band && z.lane == s.lane;
                             });
        if (!inFocus) continue;
        PlanFocus p;
        p.id = focus.id;
        p.metric = focus.metric;
        p.metricName = metric.name.empty() ? metric.id : metric.name;
        p.zoneName = zoneLabel(s.band, s.lane, grid);
        p.zones = focus.zones;
        p.linkedDrills = focus.drills;
        p.kind = metric.kind();
        p.band = s.band;
        p.lane = s.lane;
        p.value = s.value;
        p.direction = s.target->direction;
        p.target = s.target->value;
        p.pMiss = std::isnan(s.pMiss) ? 0 : s.pMiss;
        p.state = s.state;
        p.severity = severity(p.direction, p.kind, p.value, p.target, p.pMiss);
        if (!best || p.severity > best->severity) best = p;
    }
    return best;
}

bool worksOn(const Drill& d, const PlanFocus& f) {
    if (std::find(f.linkedDrills.begin(), f.linkedDrills.end(), d.id) != f.linkedDrills.end())
        return true;
    if (std::find(d.metrics.begin(), d.metrics.end(), f.metric) == d.metrics.end()) return false;
    if (d.zones.empty()) return true;
    return std::any_of(d.zones.begin(), d.zones.end(), [&](Zone z) {
        return std::find(f.zones.begin(), f.zones.end(), z) != f.zones.end();
    });
}

PlanRequest swapDrill(PlanRequest request, std::int64_t out, std::int64_t in) {
    std::erase(request.pinned, out);
    std::erase(request.removed, in);
    if (std::find(request.removed.begin(), request.removed.end(), out) == request.removed.end())
        request.removed.push_back(out);
    if (std::find(request.pinned.begin(), request.pinned.end(), in) == request.pinned.end())
        request.pinned.push_back(in);
    return request;
}

std::string_view toString(BlockRole r) {
    switch (r) {
    case BlockRole::WarmUp:
        return "warm_up";
    case BlockRole::Main:
        return "main";
    case BlockRole::CoolDown:
        return "cool_down";
    }
    return "";
}

// Planning ---------------------------------------------------------------------------------

namespace {

/// Tags compare as people write them: "Warm-up", "warm up", "warmup" and "warm_up" are one
/// tag (case, spaces, hyphens and underscores do not count).
std::string tagKey(std::string_view tag) {
    std::string key;
    for (char c : asciiLower(std::string(tag)))
        if (c != ' ' && c != '-' && c != '_') key += c;
    return key;
}

bool hasTag(const Drill& d, std::string_view tag) {
    const std::string wanted = tagKey(tag);
    return std::any_of(d.tags.begin(), d.tags.end(),
                       [&](const std::string& t) { return tagKey(t) == wanted; });
}

bool contains(const std::vector<std::int64_t>& ids, std::int64_t id) {
    return std::find(ids.begin(), ids.end(), id) != ids.end();
}

std::string quoted(const Drill& d) {
    return "drill " + std::to_string(d.id) + " '" + d.title + "'";
}

std::string valueText(MetricKind kind, double v) {
    return words::value(kind, v) + (kind == MetricKind::Count ? " a match" : kind == MetricKind::Exposure ? " per exposure" : "");
}

/// Credited minutes of `minutes` on one focus, in half-minute points: 2 a minute for the
/// first kFullCreditMinutes, 1 a minute for the next kHalfCreditMinutes, none after.
long creditPoints(int minutes) {
    const int full = std::min(minutes, kFullCreditMinutes);
    const int half = std::clamp(minutes - kFullCreditMinutes, 0, kHalfCreditMinutes);
    return 2L * full + half;
}

/// One drill the planner may use and what it may be used as.
struct Candidate {
    const Drill* drill = nullptr;
    bool warmUp = false;   ///< tagged warm_up
    bool coolDown = false; ///< tagged cool_down
    bool pinned = false;
    std::string outBecause;           ///< empty when it may be chosen
    std::vector<std::size_t> focuses; ///< focuses it works on
    int rank = 0;                     ///< 1-based position by id (the tie-break)
};

/// Chosen role per candidate (nullopt: not chosen).
using Choice = std::vector<std::optional<BlockRole>>;

long objectiveOf(const std::vector<Candidate>& cands, const Choice& choice,
                 const std::vector<int>& weights) {
    long points = 0;
    std::vector<int> onFocus(weights.size(), 0);
    for (std::size_t i = 0; i < cands.size(); ++i) {
        if (!choice[i]) continue;
        points += cands[i].drill->durationMin;
        for (std::size_t f : cands[i].focuses)
            onFocus[f] += cands[i].drill->durationMin;
    }
    for (std::size_t f = 0; f < weights.size(); ++f)
        points += weights[f] * creditPoints(onFocus[f]);
    return points;
}

/// Owns a GLPK problem.
struct GlpProblem {
    glp_prob* p = glp_create_prob();
    GlpProblem() = default;
    GlpProblem(const GlpProblem&) = delete;
    GlpProblem& operator=(const GlpProblem&) = delete;
    ~GlpProblem() { glp_delete_prob(p); }
};

/// Column of each (candidate, role) pair and of each focus's credit variables.
struct Model {
    GlpProblem glp;
    std::vector<std::array<int, 3>> column; ///< per candidate, per role: 0 = no column
    std::vector<std::array<int, 2>> credit; ///< per focus: y_full, y_half (0 = none)
    int valueRow = 0;
};

void addRow(glp_prob* p, int type, double lo, double hi, const std::vector<int>& cols,
            const std::vector<double>& coefs) {
    const int row = glp_add_rows(p, 1);
    glp_set_row_bnds(p, row, type, lo, hi);
    // GLPK's arrays are 1-based.
    std::vector<int> ind{0};
    std::vector<double> val{0};
    ind.insert(ind.end(), cols.begin(), cols.end());
    val.insert(val.end(), coefs.begin(), coefs.end());
    glp_set_mat_row(p, row, static_cast<int>(cols.size()), ind.data(), val.data());
}

/// Builds the integer program of docs/planner.md.
void buildModel(Model& m, const std::vector<Candidate>& cands, const std::vector<int>& weights,
                int sessionMinutes) {
    glp_prob* p = m.glp.p;
    glp_set_obj_dir(p, GLP_MAX);
    m.column.assign(cands.size(), {0, 0, 0});
    for (std::size_t i = 0; i < cands.size(); ++i) {
        const Candidate& c = cands[i];
        const bool main = !c.warmUp && !c.coolDown;
        const bool roles[3] = {c.warmUp, main, c.coolDown};
        for (int r = 0; r < 3; ++r) {
            if (!roles[r]) continue;
            const int col = glp_add_cols(p, 1);
            glp_set_col_kind(p, col, GLP_BV);
            // Every rule that concerns one drill alone (cap, players, yesterday, removed) is
            // x = 0; the rules over several drills are rows below.
            if (!c.outBecause.empty()) glp_set_col_bnds(p, col, GLP_FX, 0, 0);
            glp_set_obj_coef(p, col, c.drill->durationMin);
            m.column[i][static_cast<std::size_t>(r)] = col;
        }
    }
    auto roleCols = [&](int r) {
        std::vector<int> cols;
        for (const auto& c : m.column)
            if (c[static_cast<std::size_t>(r)]) cols.push_back(c[static_cast<std::size_t>(r)]);
        return cols;
    };
    // Exactly one warm-up and one cool-down.
    for (int r : {0, 2}) {
        const auto cols = roleCols(r);
        addRow(p, GLP_FX, 1, 1, cols, std::vector<double>(cols.size(), 1));
    }
    // At most one role per drill; exactly one for a pinned drill.
    for (std::size_t i = 0; i < cands.size(); ++i) {
        std::vector<int> cols;
        for (int col : m.column[i])
            if (col) cols.push_back(col);
        if (cols.size() > 1 || cands[i].pinned)
            addRow(p, cands[i].pinned ? GLP_FX : GLP_UP, cands[i].pinned ? 1 : 0, 1, cols,
                   std::vector<double>(cols.size(), 1));
    }
    // Total minutes within the session.
    {
        std::vector<int> cols;
        std::vector<double> coefs;
        for (std::size_t i = 0; i < cands.size(); ++i)
            for (int col : m.column[i])
                if (col) {
                    cols.push_back(col);
                    coefs.push_back(cands[i].drill->durationMin);
                }
        addRow(p, GLP_UP, 0, sessionMinutes, cols, coefs);
    }
    // Credited minutes per focus: y_full + y_half ≤ minutes on the focus, y_full ≤ 20,
    // y_half ≤ 20, worth 2w and w a minute (concave, so the full share fills first).
    m.credit.assign(weights.size(), {0, 0});
    for (std::size_t f = 0; f < weights.size(); ++f) {
        if (weights[f] == 0) continue;
        std::vector<int> cols;
        std::vector<double> coefs;
        for (std::size_t i = 0; i < cands.size(); ++i) {
            if (std::find(cands[i].focuses.begin(), cands[i].focuses.end(), f) ==
                cands[i].focuses.end())
                continue;
            for (int col : m.column[i])
                if (col) {
                    cols.push_back(col);
                    coefs.push_back(-cands[i].drill->durationMin);
                }
        }
        if (cols.empty()) continue;
        const int y = glp_add_cols(p, 2);
        glp_set_col_bnds(p, y, GLP_DB, 0, kFullCreditMinutes);
        glp_set_col_bnds(p, y + 1, GLP_DB, 0, kHalfCreditMinutes);
        glp_set_obj_coef(p, y, 2.0 * weights[f]);
        glp_set_obj_coef(p, y + 1, weights[f]);
        m.credit[f] = {y, y + 1};
        cols.push_back(y);
        coefs.push_back(1);
        cols.push_back(y + 1);
        coefs.push_back(1);
        addRow(p, GLP_UP, 0, 0, cols, coefs);
    }
}

enum class SolveStatus { Optimal, Infeasible };

SolveStatus solve(glp_prob* p) {
    glp_term_out(GLP_OFF);
    glp_iocp parm;
    glp_init_iocp(&parm);
    parm.presolve = GLP_ON;
    parm.msg_lev = GLP_MSG_OFF;
    parm.mip_gap = 0;
    const int rc = glp_intopt(p, &parm);
    if (rc == GLP_ENOPFS || rc == GLP_ENODFS) return SolveStatus::Infeasible;
    if (rc != 0)
        throw std::runtime_error("the planner's solver failed (GLPK code " + std::to_string(rc) +
                                 ")");
    const int status = glp_mip_status(p);
    if (status == GLP_OPT) return SolveStatus::Optimal;
    if (status == GLP_NOFEAS) return SolveStatus::Infeasible;
    throw std::runtime_error("the planner's solver stopped without an answer (GLPK status " +
                             std::to_string(status) + ")");
}

Choice readChoice(glp_prob* p, const Model& m) {
    Choice choice(m.column.size());
    const BlockRole roles[3] = {BlockRole::WarmUp, BlockRole::Main, BlockRole::CoolDown};
    for (std::size_t i = 0; i < m.column.size(); ++i)
        for (int r = 0; r < 3; ++r) {
            const int col = m.column[i][static_cast<std::size_t>(r)];
            if (col && glp_mip_col_val(p, col) > 0.5) choice[i] = roles[r];
        }
    return choice;
}

/// Every rule of the plan, checked on a choice (a guard against a solver answer that is not
/// what the model says; a failure here is a bug, not bad input).
void checkChoice(const std::vector<Candidate>& cands, const Choice& choice, int sessionMinutes) {
    int warm = 0, cool = 0, minutes = 0;
    for (std::size_t i = 0; i < cands.size(); ++i) {
        const Candidate& c = cands[i];
        if (c.pinned && !choice[i]) throw std::logic_error("planner: a pinned drill is missing");
        if (!choice[i]) continue;
        if (!c.outBecause.empty())
            throw std::logic_error("planner: chose " + quoted(*c.drill) + ", which " +
                                   c.outBecause);
        warm += *choice[i] == BlockRole::WarmUp;
        cool += *choice[i] == BlockRole::CoolDown;
        if ((*choice[i] == BlockRole::WarmUp && !c.warmUp) ||
            (*choice[i] == BlockRole::CoolDown && !c.coolDown) ||
            (*choice[i] == BlockRole::Main && (c.warmUp || c.coolDown)))
            throw std::logic_error("planner: a drill in a role its tags do not allow");
        minutes += c.drill->durationMin;
    }
    if (warm != 1 || cool != 1 || minutes > sessionMinutes)
        throw std::logic_error("planner: the solver's plan breaks a rule");
}

std::string capText(int cap, const MicrocycleDay& day) {
    return "the cap of " + std::to_string(cap) + " for " + day.label;
}

/// Why nothing can be a warm-up (or cool-down): how the drills with that tag were ruled out.
std::string noneFits(const std::vector<Candidate>& cands, bool warmUp, int cap,
                     const MicrocycleDay& day, int players) {
    const std::string what = warmUp ? "warm-up" : "cool-down";
    const std::string_view tag = warmUp ? kWarmUpTag : kCoolDownTag;
    int tagged = 0, aboveCap = 0, tooMany = 0, other = 0;
    for (const Candidate& c : cands) {
        if (!(warmUp ? c.warmUp : c.coolDown)) continue;
        ++tagged;
        if (c.drill->intensity > cap)
            ++aboveCap;
        else if (c.drill->playersMin > players)
            ++tooMany;
        else
            ++other;
    }
    if (tagged == 0)
        return "no " + what + " fits: no drill in the book has the role " + what + " or the tag " +
               std::string(tag);
    std::string s = "no " + what + " fits: of the " + std::to_string(tagged) + " " + what + " drills";
    std::vector<std::string> parts;
    if (aboveCap) parts.push_back(std::to_string(aboveCap) + " above " + capText(cap, day));
    if (tooMany)
        parts.push_back(std::to_string(tooMany) + " need more than the " + std::to_string(players) +
                        " players available");
    if (other) parts.push_back(std::to_string(other) + " removed or done yesterday");
    for (std::size_t i = 0; i < parts.size(); ++i)
        s += (i == 0 ? ", " : i + 1 == parts.size() ? " and " : ", ") + parts[i];
    return s;
}

std::string whyLine(const PlanBlock& b, const Candidate& c, const PlanRequest& req, int cap,
                    const MicrocycleDay& day) {
    std::string s;
    if (b.pinned) s += "pinned by the coach; ";
    if (b.role == BlockRole::WarmUp) s += "warm-up; ";
    if (b.role == BlockRole::CoolDown) s += "cool-down; ";
    if (b.focus) {
        const PlanFocus& f = req.focuses[*b.focus];
        s += (f.watched ? std::string("watched zone, no focus open: ")
                        : "focus " + (f.id ? std::to_string(f.id) + ", " : std::string())) +
             (f.metricName.empty() ? f.metric : f.metricName) + " · " +
             (f.zoneName.empty() ? zoneCode(f.band, f.lane) : f.zoneName) + ": " +
             valueText(f.kind, f.value) + " against " +
             (f.direction == Direction::AtLeast ? "at least " : "at most ") +
             valueText(f.kind, f.target) + " (" +
             (f.state == FlagState::NoTarget ? std::string() : words::stateName(f.state) + ", ") +
             "P(miss) " + words::probability(f.pMiss) + ")" +
             (f.severity > 0 ? "" : ", so it has no priority today") + " — this drill ";
        if (contains(f.linkedDrills, c.drill->id))
            s += "is linked to the focus";
        else if (c.drill->zones.empty())
            s += "works on " + (f.metricName.empty() ? f.metric : f.metricName) + " over the whole pitch";
        else
            s += "works on " + (f.metricName.empty() ? f.metric : f.metricName) + " in the focus's zones";
        if (!b.alsoFocuses.empty())
            s += "; also covers " + std::to_string(b.alsoFocuses.size()) +
                 (b.alsoFocuses.size() == 1 ? " more focus" : " more focuses");
    } else if (b.role == BlockRole::Main) {
        s += "uses the remaining time (works on no open focus); intensity " +
             std::to_string(b.intensity) + " within " + capText(cap, day);
    } else {
        s += (c.drill->role != DrillRole::Any
                  ? std::string("its role is ") + (b.role == BlockRole::WarmUp ? "warm-up" : "cool-down")
                  : "tagged " + std::string(b.role == BlockRole::WarmUp ? kWarmUpTag : kCoolDownTag)) +
             ", intensity " + std::to_string(b.intensity) + " within " + capText(cap, day);
    }
    return s;
}

} // namespace

PlanResult planSession(const PlanRequest& req) {
    PlanResult result;
    auto fail = [&](std::string message) {
        result.problem = std::move(message);
        return result;
    };

    // Input that no plan can use.
    if (!dayNumber(req.date)) return fail("'" + req.date + "' is not a date YYYY-MM-DD");
    if (req.minutes <= 0)
        return fail("a session needs a positive number of minutes (got " +
                    std::to_string(req.minutes) + ")");
    if (req.playersAvailable <= 0)
        return fail("no players are available (got " + std::to_string(req.playersAvailable) +
                    "): a session needs at least one player");
    if (seasonOf(req.date) != req.season) {
        const int first = req.season.size() == 7 ? std::atoi(req.season.substr(0, 4).c_str()) : 0;
        if (first < 1900) return fail("'" + req.season + "' is not a season name such as 2026-27");
        return fail(req.date + " is outside season " + req.season + " (" + std::to_string(first) +
                    "-07-01 to " + std::to_string(first + 1) + "-06-30)");
    }
    std::vector<Fixture> fixtures;
    for (const Fixture& f : req.fixtures)
        if (dayNumber(f.date) && seasonOf(f.date) == req.season) fixtures.push_back(f);
    if (fixtures.empty())
        return fail("season " + req.season + " has no fixtures, so " + req.date +
                    " has no microcycle day: import the schedule or enter the fixtures first");

    const MicrocycleDay day = microcycle(req.date, fixtures);
    const int cap = *intensityCap(day, req.caps);
    if (cap < kIntensityMin && day.label == "MD")
        return fail(req.date + " is match day (" + day.next->venue + " against " +
                    day.next->opponent + "): no training session is planned on MD");
    if (cap < kIntensityMin)
        return fail("the intensity cap for " + day.label + " is " + std::to_string(cap) +
                    ": no session is planned on that day (the caps can be edited)");

    // Drills, their roles, the focuses they work on, and what rules them out.
    std::vector<const Drill*> book;
    for (const Drill& d : req.drills)
        if (!d.deleted) book.push_back(&d);
    if (book.empty()) return fail("the drill book is empty: add drills to plan a session");
    std::sort(book.begin(), book.end(),
              [](const Drill* a, const Drill* b) { return a->id < b->id; });
    for (std::size_t i = 1; i < book.size(); ++i)
        if (book[i]->id == book[i - 1]->id)
            return fail("drill " + std::to_string(book[i]->id) + " is in the drill book twice");
    auto inBook = [&](std::int64_t id) {
        return std::any_of(book.begin(), book.end(), [&](const Drill* d) { return d->id == id; });
    };
    for (std::int64_t id : req.pinned) {
        if (contains(req.removed, id))
            return fail("drill " + std::to_string(id) + " is both pinned and removed");
        if (!inBook(id))
            return fail("pinned drill " + std::to_string(id) + " is not in the drill book");
    }

    std::vector<Candidate> cands;
    for (std::size_t i = 0; i < book.size(); ++i) {
        const Drill& d = *book[i];
        Candidate c;
        c.drill = &d;
        c.rank = static_cast<int>(i) + 1;
        // The drill's role when its author set one; else its tags, however spelt.
        c.warmUp = d.role == DrillRole::WarmUp || (d.role == DrillRole::Any && hasTag(d, kWarmUpTag));
        c.coolDown = d.role == DrillRole::CoolDown || (d.role == DrillRole::Any && hasTag(d, kCoolDownTag));
        c.pinned = contains(req.pinned, d.id);
        if (contains(req.removed, d.id))
            c.outBecause = "was removed by the coach";
        else if (d.intensity > cap)
            c.outBecause =
                "is intensity " + std::to_string(d.intensity) + ", above " + capText(cap, day);
        else if (d.playersMin > req.playersAvailable)
            c.outBecause = "needs at least " + std::to_string(d.playersMin) + " players; " +
                           std::to_string(req.playersAvailable) + " are available";
        // A warm-up or cool-down routine may repeat from day to day; a main drill may not
        // (common practice, no published source).
        else if (!c.pinned && !c.warmUp && !c.coolDown && contains(req.yesterday, d.id))
            c.outBecause = "was done yesterday (pin it to repeat it)";
        for (std::size_t f = 0; f < req.focuses.size(); ++f)
            if (worksOn(d, req.focuses[f])) c.focuses.push_back(f);
        if (c.pinned && !c.outBecause.empty())
            return fail("pinned " + quoted(d) + " " + c.outBecause);
        cands.push_back(std::move(c));
    }

    auto fits = [](const Candidate& c) { return c.outBecause.empty(); };
    if (std::none_of(cands.begin(), cands.end(),
                     [&](const Candidate& c) { return c.drill->intensity <= cap; })) {
        int lightest = kIntensityMax + 1;
        for (const Candidate& c : cands)
            lightest = std::min(lightest, c.drill->intensity);
        return fail("no drill in the book fits " + capText(cap, day) +
                    " (the lightest is intensity " + std::to_string(lightest) + ")");
    }
    if (std::none_of(cands.begin(), cands.end(), fits))
        return fail("no drill fits the day: every drill within " + capText(cap, day) +
                    " needs more than the " + std::to_string(req.playersAvailable) +
                    " players available, was removed, or was done yesterday");

    // The shortest warm-up and cool-down that fit (a pinned one when pinned).
    auto shortest = [&](bool warm) -> const Candidate* {
        const Candidate* best = nullptr;
        for (const Candidate& c : cands) {
            if (!(warm ? c.warmUp : c.coolDown) || !fits(c)) continue;
            if (c.pinned && !(warm ? c.coolDown : c.warmUp)) return &c;
            if (!best || c.drill->durationMin < best->drill->durationMin) best = &c;
        }
        return best;
    };
    const Candidate* warm = shortest(true);
    const Candidate* cool = shortest(false);
    if (!warm) return fail(noneFits(cands, true, cap, day, req.playersAvailable));
    if (!cool) return fail(noneFits(cands, false, cap, day, req.playersAvailable));
    if (warm != cool && req.minutes < warm->drill->durationMin + cool->drill->durationMin)
        return fail("a " + std::to_string(req.minutes) +
                    "-minute session is shorter than the shortest warm-up (" +
                    std::to_string(warm->drill->durationMin) + " min, " + quoted(*warm->drill) +
                    ") plus the shortest cool-down (" + std::to_string(cool->drill->durationMin) +
                    " min, " + quoted(*cool->drill) + ") that fit the day");

    // Focus weights (hundredths of severity) and the two-stage integer program: the best value
    // first, then among plans of that value the smallest sum of id ranks (the tie-break).
    std::vector<int> weights;
    for (const PlanFocus& f : req.focuses)
        weights.push_back(focusWeight(f.severity));
    Model m;
    buildModel(m, cands, weights, req.minutes);
    if (solve(m.glp.p) == SolveStatus::Infeasible) {
        int pinnedMinutes = 0;
        bool warmPinned = false, coolPinned = false;
        for (const Candidate& c : cands)
            if (c.pinned) {
                pinnedMinutes += c.drill->durationMin;
                warmPinned |= c.warmUp;
                coolPinned |= c.coolDown;
            }
        const int needed = pinnedMinutes + (warmPinned ? 0 : warm->drill->durationMin) +
                           (coolPinned ? 0 : cool->drill->durationMin);
        if (needed > req.minutes)
            return fail("the pinned drills take " + std::to_string(pinnedMinutes) +
                        " minutes; with a warm-up and a cool-down that makes at least " +
                        std::to_string(needed) + ", more than the session's " +
                        std::to_string(req.minutes) + ": unpin a drill or lengthen the session");
        return fail("no plan meets every rule: check the pinned drills (a session has one "
                    "warm-up and one cool-down) and the session's minutes");
    }
    Choice choice = readChoice(m.glp.p, m);
    checkChoice(cands, choice, req.minutes);
    const long best = objectiveOf(cands, choice, weights);
    {
        glp_prob* p = m.glp.p;
        std::vector<int> cols;
        std::vector<double> coefs;
        for (int col = 1; col <= glp_get_num_cols(p); ++col) {
            cols.push_back(col);
            coefs.push_back(glp_get_obj_coef(p, col));
            glp_set_obj_coef(p, col, 0);
        }
        addRow(p, GLP_LO, static_cast<double>(best) - 0.5, 0, cols, coefs);
        for (std::size_t i = 0; i < cands.size(); ++i)
            for (int col : m.column[i])
                if (col) glp_set_obj_coef(p, col, cands[i].rank);
        glp_set_obj_dir(p, GLP_MIN);
        if (solve(p) == SolveStatus::Optimal) {
            Choice tieBroken = readChoice(p, m);
            checkChoice(cands, tieBroken, req.minutes);
            if (objectiveOf(cands, tieBroken, weights) == best) choice = std::move(tieBroken);
        }
    }

    // The plan: blocks in order, each explained; minutes per focus.
    Plan plan;
    plan.date = req.date;
    plan.day = day;
    plan.cap = cap;
    plan.sessionMinutes = req.minutes;
    plan.playersAvailable = req.playersAvailable;
    plan.objective = best;
    std::vector<std::size_t> bySeverity(req.focuses.size());
    std::iota(bySeverity.begin(), bySeverity.end(), 0);
    std::stable_sort(bySeverity.begin(), bySeverity.end(), [&](std::size_t a, std::size_t b) {
        return req.focuses[a].severity > req.focuses[b].severity;
    });
    std::vector<PlanBlock> blocks;
    for (std::size_t i = 0; i < cands.size(); ++i) {
        if (!choice[i]) continue;
        const Candidate& c = cands[i];
        PlanBlock b;
        b.role = *choice[i];
        b.drillId = c.drill->id;
        b.title = c.drill->title;
        b.minutes = c.drill->durationMin;
        b.intensity = c.drill->intensity;
        b.pinned = c.pinned;
        for (std::size_t f : bySeverity)
            if (std::find(c.focuses.begin(), c.focuses.end(), f) != c.focuses.end()) {
                if (!b.focus)
                    b.focus = f;
                else
                    b.alsoFocuses.push_back(f);
            }
        b.why = whyLine(b, c, req, cap, day);
        plan.minutesUsed += b.minutes;
        blocks.push_back(std::move(b));
    }
    auto order = [](const PlanBlock& b) {
        return b.role == BlockRole::WarmUp ? 0 : b.role == BlockRole::Main ? 1 : 2;
    };
    std::sort(blocks.begin(), blocks.end(), [&](const auto& a, const auto& b) {
        if (order(a) != order(b)) return order(a) < order(b);
        if (a.intensity != b.intensity) return a.intensity > b.intensity;
        return a.drillId < b.drillId;
    });
    plan.blocks = std::move(blocks);
    for (std::size_t f = 0; f < req.focuses.size(); ++f) {
        FocusMinutes fm{f, req.focuses[f].id, 0};
        for (std::size_t i = 0; i < cands.size(); ++i)
            if (choice[i] && std::find(cands[i].focuses.begin(), cands[i].focuses.end(), f) !=
                                 cands[i].focuses.end())
                fm.minutes += cands[i].drill->durationMin;
        plan.focusMinutes.push_back(fm);
    }
    // A session left short by five minutes or more: say what the drill book lacks today.
    if (plan.sessionMinutes - plan.minutesUsed >= 5) {
        int mains = 0, aboveCap = 0, tooFewPlayers = 0, yesterdayOut = 0, removedOut = 0, tooLong = 0;
        const int room = plan.sessionMinutes - plan.minutesUsed;
        for (std::size_t i = 0; i < cands.size(); ++i) {
            const Candidate& c = cands[i];
            if (c.warmUp || c.coolDown || choice[i]) continue;
            ++mains;
            if (contains(req.removed, c.drill->id)) ++removedOut;
            else if (c.drill->intensity > cap) ++aboveCap;
            else if (c.drill->playersMin > req.playersAvailable) ++tooFewPlayers;
            else if (contains(req.yesterday, c.drill->id) && !c.pinned) ++yesterdayOut;
            else if (c.drill->durationMin > room) ++tooLong;
        }
        std::string why;
        const auto add = [&](int n, const std::string& what) {
            if (n > 0) why += (why.empty() ? "" : ", ") + std::to_string(n) + " " + what;
        };
        add(aboveCap, "above " + capText(cap, day));
        add(tooFewPlayers, "need more than the " + std::to_string(req.playersAvailable) + " players available");
        add(yesterdayOut, "done yesterday");
        add(removedOut, "removed");
        add(tooLong, "longer than the " + std::to_string(room) + " minutes left");
        plan.notes.push_back(
            std::to_string(plan.minutesUsed) + " of " + std::to_string(plan.sessionMinutes) +
            " minutes planned: the drill book has no other main drill that fits today" +
            (mains > 0 ? " (of its " + std::to_string(mains) + " other main drills: " + why + ")" : "") +
            ". A main drill of intensity " + std::to_string(cap) + " or less for " +
            std::to_string(req.playersAvailable) + " players, up to " + std::to_string(room) +
            " minutes long, would fill it.");
    }
    result.plan = std::move(plan);
    return result;
}

} // namespace pitchloop::model
