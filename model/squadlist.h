#pragma once
// A squad's list of players (docs/moments.md, "Who was involved"): shirt number, name and
// position, typed or imported by the staff, so that the moments behind a zone name the players
// in them and can be filtered by one player or by a unit ("our left side"). Match files carry
// only the ids their source gives (usually shirt numbers); this list turns ours into names.

#include "problem.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

struct Player {
    std::string number;   ///< as the match files give it: "7"
    std::string name;     ///< "A. Example"
    std::string position; ///< one of knownPositions(), upper-case: "LB"
    bool operator==(const Player&) const = default;
};

/// Units a position belongs to: by line and by side.
enum class Unit { Goalkeeper, Defence, Midfield, Attack, LeftSide, RightSide, Centre };
std::string_view toString(Unit u); ///< "goalkeeper", "defence", "midfield", "attack", "left_side", "right_side", "centre"
std::optional<Unit> unitFromString(std::string_view s);
/// In a sentence: "our goalkeeper", "our defence", ..., "our left side".
std::string unitWords(Unit u);
const std::vector<Unit>& allUnits();

/// The positions the list takes (the trade's usual abbreviations): GK; RB, RWB, CB, LB, LWB;
/// DM, CM, AM, RM, LM; RW, LW, CF, ST.
const std::vector<std::string_view>& knownPositions();
/// Whether a position (any case) belongs to a unit: wide right (RB, RWB, RM, RW) is our right
/// side, wide left our left side, the rest the centre; GK alone is the goalkeeper; full-backs,
/// wing-backs and CB the defence; DM, CM, AM, RM, LM the midfield; RW, LW, CF, ST the attack.
bool inUnit(std::string_view position, Unit unit);

struct SquadListResult {
    std::vector<Player> players;
    Problems errors;
};

/// Reads a squad list: a table (CSV, TSV or semicolons with a header; model/table) with the
/// columns number, name and position in any order and case. Each problem names the file, the line
/// and the column: a missing column, an empty number or name, a number given twice, a position
/// not in knownPositions().
SquadListResult parseSquadList(std::string_view text, const std::string& fileName);

/// Checks one player as typed in a form: the same rules as a file's row. `taken` are the other
/// players' numbers.
Problems checkPlayer(const Player& p, const std::vector<std::string>& taken);

} // namespace pitchloop::model
