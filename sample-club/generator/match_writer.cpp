#include "match_writer.h"

#include <algorithm>
#include <cmath>
#include <nlohmann/json.hpp>

namespace pitchloop::demo {
namespace {

using Json = nlohmann::ordered_json;

const char* typeName(EventType type) {
    switch (type) {
    case EventType::Pass:
        return "pass";
    case EventType::Carry:
        return "carry";
    case EventType::TakeOn:
        return "take_on";
    case EventType::Shot:
        return "shot";
    case EventType::Recovery:
        return "recovery";
    case EventType::Interception:
        return "interception";
    case EventType::Tackle:
        return "tackle";
    case EventType::Keeper:
        return "keeper";
    case EventType::Clearance:
        return "clearance";
    case EventType::Block:
        return "block";
    case EventType::Foul:
        return "foul";
    case EventType::Out:
        return "out";
    }
    return "pass";
}

const char* outcomeName(Outcome outcome) {
    switch (outcome) {
    case Outcome::Ok:
        return "ok";
    case Outcome::Fail:
        return "fail";
    case Outcome::Goal:
        return "goal";
    case Outcome::Saved:
        return "saved";
    case Outcome::Blocked:
        return "blocked";
    case Outcome::Off:
        return "off";
    case Outcome::Post:
        return "post";
    case Outcome::None:
        break;
    }
    return "";
}

const char* frameName(Frame frame) {
    switch (frame) {
    case Frame::Us:
        return "us";
    case Frame::Ground:
        return "ground";
    case Frame::Acting:
        break;
    }
    return "acting";
}

constexpr std::array<std::pair<Tag, const char*>, 11> kTagNames{{
    {Tag::Cross, "cross"},
    {Tag::Cutback, "cutback"},
    {Tag::ThroughBall, "through_ball"},
    {Tag::LongBall, "long_ball"},
    {Tag::Header, "header"},
    {Tag::SetPiece, "set_piece"},
    {Tag::ThrowIn, "throw_in"},
    {Tag::Corner, "corner"},
    {Tag::FreeKick, "free_kick"},
    {Tag::GoalKick, "goal_kick"},
    {Tag::KickOff, "kick_off"},
}};

// Rounds to 0.1 and clamps; adding 0.0 turns a possible -0.0 into 0.0.
double tenth(double v, double hi) {
    return std::clamp(std::round(v * 10.0) / 10.0, 0.0, hi) + 0.0;
}

// Maps a point from the acting side's direction into the file's frame.
class FrameMapper {
  public:
    FrameMapper(const MatchRecord& record)
        : m_frame(record.fixture.frame), m_len(record.pitchLength), m_wid(record.pitchWidth),
          m_usPlusX(record.usAttackPlusX) {}

    std::pair<double, double> map(const MatchEvent& ev, double x, double y) const {
        if (m_frame == Frame::Acting) {
            return {x, y};
        }
        if (ev.side == Side::Opp) {
            x = m_len - x;
            y = m_wid - y;
        }
        if (m_frame == Frame::Ground && !m_usPlusX[static_cast<std::size_t>(ev.period - 1)]) {
            x = m_len - x;
            y = m_wid - y;
        }
        return {x, y};
    }

  private:
    Frame m_frame;
    double m_len;
    double m_wid;
    std::array<bool, 2> m_usPlusX;
};

Json eventJson(const MatchEvent& ev, const FrameMapper& mapper, double len, double wid) {
    Json j;
    j["period"] = ev.period;
    j["t"] = ev.tenths / 10.0;
    j["side"] = ev.side == Side::Us ? "us" : "opp";
    j["player"] = std::to_string(ev.shirt);
    j["type"] = typeName(ev.type);
    if (ev.outcome != Outcome::None) {
        j["result"] = outcomeName(ev.outcome);
    }
    const auto [x, y] = mapper.map(ev, ev.x, ev.y);
    j["x"] = tenth(x, len);
    j["y"] = tenth(y, wid);
    if (ev.hasEnd) {
        const auto [tx, ty] = mapper.map(ev, ev.toX, ev.toY);
        j["to_x"] = tenth(tx, len);
        j["to_y"] = tenth(ty, wid);
    }
    if (ev.tags != 0) {
        Json tags = Json::array();
        for (const auto& [tag, name] : kTagNames) {
            if (hasTag(ev.tags, tag)) {
                tags.push_back(name);
            }
        }
        j["tags"] = std::move(tags);
    }
    if (!ev.clip.empty()) {
        j["clip"] = ev.clip;
    }
    return j;
}

} // namespace

std::string renderMatchFile(const MatchRecord& record, const std::string& clubName) {
    const Fixture& fx = record.fixture;
    Json match;
    match["id"] = fx.id;
    match["date"] = fx.date;
    match["competition"] = "League";
    match["venue"] = fx.home ? "home" : "away";
    match["us"] = clubName;
    match["opponent"] = record.opponentName;
    match["score"] = {{"us", record.score[0]}, {"opponent", record.score[1]}};
    match["pitch"] = {{"length_m", record.pitchLength}, {"width_m", record.pitchWidth}};
    match["periods"] = Json::array({{{"n", 1}, {"length_s", record.periodSeconds[0]}},
                                    {{"n", 2}, {"length_s", record.periodSeconds[1]}}});
    match["frame"] = frameName(fx.frame);
    if (fx.frame == Frame::Ground) {
        match["us_attack"] = {{"1", record.usAttackPlusX[0] ? "+x" : "-x"},
                              {"2", record.usAttackPlusX[1] ? "+x" : "-x"}};
    }
    // One file carries an extra match-level field that readers should ignore.
    if (fx.number == 12) {
        match["weather"] = "steady rain, heavy pitch";
    }

    std::string header = match.dump(2);
    std::string indented;
    indented.reserve(header.size() + 64);
    for (char c : header) {
        indented += c;
        if (c == '\n') {
            indented += "  ";
        }
    }

    const FrameMapper mapper(record);
    std::string out;
    out.reserve(record.events.size() * 130 + indented.size() + 128);
    out += "{\n  \"format\": \"pitchloop-match\",\n  \"version\": 1,\n  \"match\": ";
    out += indented;
    out += ",\n  \"events\": [\n";
    for (std::size_t i = 0; i < record.events.size(); ++i) {
        out += "    ";
        out += eventJson(record.events[i], mapper, record.pitchLength, record.pitchWidth).dump();
        out += i + 1 < record.events.size() ? ",\n" : "\n";
    }
    out += "  ]\n}\n";
    return out;
}

MatchSummary summarize(const MatchRecord& record) {
    MatchSummary s;
    s.events = static_cast<int>(record.events.size());
    for (const auto& ev : record.events) {
        const auto side = static_cast<std::size_t>(ev.side);
        if (ev.type == EventType::Pass) {
            ++s.passes[side];
            if (ev.outcome == Outcome::Ok) {
                ++s.passesOk[side];
            }
        } else if (ev.type == EventType::Shot) {
            ++s.shots[side];
        }
    }
    return s;
}

} // namespace pitchloop::demo
