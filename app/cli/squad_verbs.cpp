#include "squad_verbs.h"

#include "commands.h"
#include "format.h"
#include "matchreader.h"
#include "squadlist.h"

#include <algorithm>

namespace pitchloop::cli {

using namespace pitchloop::model;

SquadVerbs::SquadVerbs(CLI::App& app) {
    m_group = app.add_subcommand("squad", "A squad's list of players: number, name and position");
    m_group->require_subcommand(1);
    auto squad = [&](CLI::App* sub) { sub->add_option("--squad", m_squad, "Squad")->capture_default_str(); };
    m_list = m_group->add_subcommand("list", "The players, by number");
    squad(m_list);
    m_import = m_group->add_subcommand("import", "Replace the list with a table's (columns number, name, "
                                                 "position; all or nothing)");
    m_import->add_option("file", m_file, "CSV file")->required();
    squad(m_import);
    m_add = m_group->add_subcommand("add", "Add a player, or change one with the same number");
    m_add->add_option("number", m_number, "Shirt number (the id the match files give)")->required();
    m_add->add_option("--name", m_name, "Name")->required();
    m_add->add_option("--position", m_position, "GK, RB, RWB, CB, LB, LWB, DM, CM, AM, RM, LM, RW, LW, CF or ST")
        ->required();
    squad(m_add);
    m_remove = m_group->add_subcommand("remove", "Remove a player");
    m_remove->add_option("number", m_number, "Shirt number")->required();
    squad(m_remove);
}

int SquadVerbs::run(const Globals& g, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    std::vector<Player> players = repo->squadList(m_squad);
    if (m_list->parsed()) {
        if (players.empty()) err << "the squad list of " << m_squad << " is empty\n";
        for (const Player& p : players)
            out << padColumn(p.number, 5) << padColumn(p.position, 5) << p.name << "\n";
        return kExitOk;
    }
    if (m_import->parsed()) {
        std::string bytes;
        try {
            bytes = readFileBytes(m_file);
        } catch (const IoError& e) {
            err << "error: " << e.what() << "\n";
            return kExitBadInput;
        }
        const SquadListResult read = parseSquadList(bytes, m_file);
        if (!read.errors.empty()) {
            for (const Problem& p : read.errors) err << "error: " << p.describe() << "\n";
            return kExitBadInput;
        }
        repo->replaceSquadList(m_squad, read.players);
        err << "saved " << read.players.size() << " players for " << m_squad << "\n";
        return kExitOk;
    }
    if (m_add->parsed()) {
        Player p{m_number, m_name, m_position};
        std::transform(p.position.begin(), p.position.end(), p.position.begin(),
                       [](unsigned char c) { return static_cast<char>(std::toupper(c)); });
        std::vector<std::string> taken;
        for (const Player& q : players)
            if (q.number != p.number) taken.push_back(q.number);
        if (const Problems problems = checkPlayer(p, taken); !problems.empty()) {
            for (const Problem& problem : problems)
                err << "error: --" << problem.field << ": " << problem.message << "\n";
            return kExitBadInput;
        }
        std::erase_if(players, [&](const Player& q) { return q.number == p.number; });
        players.push_back(p);
        repo->replaceSquadList(m_squad, players);
        err << "saved " << p.number << " " << p.name << " (" << p.position << ") for " << m_squad << "\n";
        return kExitOk;
    }
    const auto before = players.size();
    std::erase_if(players, [&](const Player& q) { return q.number == m_number; });
    if (players.size() == before) {
        err << "error: no player " << m_number << " in the squad list of " << m_squad << "\n";
        return kExitBadInput;
    }
    repo->replaceSquadList(m_squad, players);
    err << "removed " << m_number << " from " << m_squad << "\n";
    return kExitOk;
}

} // namespace pitchloop::cli
