#include "season.h"

#include "rng.h"

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <span>

namespace pitchloop::demo {
namespace {

using R = Role;

constexpr Formation kFourThreeThree{"4-3-3",
                                    {{{R::Goalkeeper, 0.04, 0.50},
                                      {R::RightBack, 0.36, 0.08},
                                      {R::RightCentreBack, 0.20, 0.34},
                                      {R::LeftCentreBack, 0.20, 0.66},
                                      {R::LeftBack, 0.36, 0.92},
                                      {R::DefensiveMid, 0.42, 0.50},
                                      {R::RightCentreMid, 0.56, 0.32},
                                      {R::LeftCentreMid, 0.56, 0.68},
                                      {R::RightWing, 0.80, 0.07},
                                      {R::LeftWing, 0.80, 0.93},
                                      {R::Striker, 0.88, 0.50}}}};

constexpr Formation kFourFourTwo{"4-4-2",
                                 {{{R::Goalkeeper, 0.04, 0.50},
                                   {R::RightBack, 0.34, 0.08},
                                   {R::RightCentreBack, 0.20, 0.35},
                                   {R::LeftCentreBack, 0.20, 0.65},
                                   {R::LeftBack, 0.34, 0.92},
                                   {R::RightMid, 0.62, 0.09},
                                   {R::RightCentreMid, 0.50, 0.38},
                                   {R::LeftCentreMid, 0.50, 0.62},
                                   {R::LeftMid, 0.62, 0.91},
                                   {R::Striker, 0.86, 0.40},
                                   {R::Striker, 0.84, 0.60}}}};

constexpr Formation kFourTwoThreeOne{"4-2-3-1",
                                     {{{R::Goalkeeper, 0.04, 0.50},
                                       {R::RightBack, 0.35, 0.08},
                                       {R::RightCentreBack, 0.20, 0.35},
                                       {R::LeftCentreBack, 0.20, 0.65},
                                       {R::LeftBack, 0.35, 0.92},
                                       {R::DefensiveMid, 0.44, 0.38},
                                       {R::DefensiveMid, 0.44, 0.62},
                                       {R::RightWing, 0.74, 0.09},
                                       {R::AttackingMid, 0.70, 0.50},
                                       {R::LeftWing, 0.74, 0.91},
                                       {R::Striker, 0.88, 0.50}}}};

constexpr Formation kThreeFiveTwo{"3-5-2",
                                  {{{R::Goalkeeper, 0.04, 0.50},
                                    {R::RightCentreBack, 0.22, 0.25},
                                    {R::CentreBack, 0.18, 0.50},
                                    {R::LeftCentreBack, 0.22, 0.75},
                                    {R::RightWingBack, 0.52, 0.06},
                                    {R::RightCentreMid, 0.52, 0.34},
                                    {R::DefensiveMid, 0.44, 0.50},
                                    {R::LeftCentreMid, 0.52, 0.66},
                                    {R::LeftWingBack, 0.52, 0.94},
                                    {R::Striker, 0.86, 0.40},
                                    {R::Striker, 0.84, 0.60}}}};

// Conventional shirt numbers per slot for each formation above.
constexpr std::array<int, 11> kNumbers433{1, 2, 5, 4, 3, 6, 8, 10, 7, 11, 9};
constexpr std::array<int, 11> kNumbers442{1, 2, 5, 4, 3, 7, 8, 6, 11, 9, 10};
constexpr std::array<int, 11> kNumbers4231{1, 2, 5, 4, 3, 6, 8, 7, 10, 11, 9};
constexpr std::array<int, 11> kNumbers352{1, 4, 5, 6, 2, 8, 16, 10, 3, 9, 11};

// Invented league: place names made up for the demo, checked not to match any club we know of.
struct OpponentSeed {
    const char* name;
    int length;
    int width;
    int formation;   // 0 = 4-3-3, 1 = 4-4-2, 2 = 4-2-3-1, 3 = 3-5-2
    double strength; // -1 weakest .. +1 strongest
};

constexpr std::array<OpponentSeed, 17> kOpponents{{
    {"Tarnwick Athletic", 105, 68, 1, 0.55},
    {"Saltmere United", 100, 64, 2, 0.80},
    {"Brackenmoor Rangers", 110, 70, 0, 0.20},
    {"Fenhollow Town", 102, 66, 1, -0.35},
    {"Pellingford Albion", 105, 68, 2, 0.40},
    {"Corvan Harbour", 104, 67, 3, -0.10},
    {"Duneford City", 108, 70, 0, 0.95},
    {"Ostry Vale", 100, 65, 1, -0.80},
    {"Quillon Park Rovers", 105, 70, 2, 0.05},
    {"Sedgecombe Athletic", 106, 69, 3, -0.55},
    {"Larkspur Wanderers", 103, 66, 0, 0.30},
    {"Greywater Borough", 110, 75, 1, -0.20},
    {"Thornvale Harriers", 104, 68, 2, 0.65},
    {"Nettleby Town", 101, 65, 1, -0.95},
    {"Marram Point", 105, 68, 3, -0.65},
    {"Caddon Mills", 107, 69, 2, -0.45},
    {"Ravelmoor United", 105, 70, 0, 0.10},
}};

const Formation& formationByIndex(int index) {
    switch (index) {
    case 1:
        return kFourFourTwo;
    case 2:
        return kFourTwoThreeOne;
    case 3:
        return kThreeFiveTwo;
    default:
        return kFourThreeThree;
    }
}

const std::array<int, 11>& numbersByIndex(int index) {
    switch (index) {
    case 1:
        return kNumbers442;
    case 2:
        return kNumbers4231;
    case 3:
        return kNumbers352;
    default:
        return kNumbers433;
    }
}

Team makeClub() {
    Team club;
    club.name = "Kestrel Bay";
    club.pitchLength = 105;
    club.pitchWidth = 68;
    club.formation = &kFourThreeThree;
    club.squad.starters = kNumbers433;
    // Slots: 0 GK, 1 RB, 2 RCB, 3 LCB, 4 LB, 5 DM, 6 RCM, 7 LCM, 8 RW, 9 LW, 10 ST.
    club.squad.bench = {{13, 0}, {14, 2}, {21, 3}, {22, 1}, {15, 4},  {19, 5},
                        {16, 6}, {12, 7}, {17, 8}, {20, 9}, {18, 10}, {23, 10}};
    club.style.passSkill = 0.012;
    club.style.pressHigh = 0.74;
    club.style.pressMid = 0.45;
    club.style.pressDeep = 0.30;
    club.style.attack = 1.12;
    club.style.finishing = 1.06;
    club.style.keeping = 1.06;
    club.style.directness = 0.08;
    club.style.foulRate = 0.95;
    return club;
}

Team makeOpponent(const OpponentSeed& seed, Rng& rng) {
    Team team;
    team.name = seed.name;
    team.pitchLength = seed.length;
    team.pitchWidth = seed.width;
    team.formation = &formationByIndex(seed.formation);
    team.squad.starters = numbersByIndex(seed.formation);

    // Squads are not all textbook 1-11: some starters wear squad numbers.
    std::vector<int> free;
    for (int n = 12; n <= 35; ++n) {
        free.push_back(n);
    }
    rng.shuffle(std::span<int>(free));
    std::size_t nextFree = 0;
    for (std::size_t slot = 1; slot < 11; ++slot) {
        if (rng.chance(0.3)) {
            team.squad.starters[slot] = free[nextFree++];
        }
    }
    for (int slot : {0, 2, 1, 5, 6, 8, 10}) {
        team.squad.bench.push_back({free[nextFree++], slot});
    }

    const double s = seed.strength;
    team.style.passSkill = 0.018 * s + 0.002;
    team.style.pressHigh = 0.55 + 0.04 * s;
    team.style.pressMid = 0.36 + 0.03 * s;
    team.style.pressDeep = 0.26 + 0.02 * s;
    team.style.attack = 0.94 + 0.12 * s;
    team.style.finishing = 0.98 + 0.08 * s;
    team.style.keeping = 1.0 + 0.06 * s;
    team.style.directness = 0.05 + 0.07 * rng.uniform();
    team.style.foulRate = 0.95 + 0.3 * rng.uniform();
    return team;
}

std::string isoDate(std::chrono::sys_days day) {
    const std::chrono::year_month_day ymd{day};
    char buf[16];
    std::snprintf(buf, sizeof buf, "%04d-%02u-%02u", static_cast<int>(ymd.year()),
                  static_cast<unsigned>(ymd.month()), static_cast<unsigned>(ymd.day()));
    return buf;
}

// Two congested weeks get an extra Wednesday fixture: 32 Saturdays + 2 Wednesdays = 34.
std::vector<std::string> fixtureDates() {
    using namespace std::chrono;
    const sys_days firstSaturday = sys_days{year{2026} / August / 8};
    constexpr std::array<int, 2> midweekAfterWeek{9, 20};
    std::vector<std::string> dates;
    for (int week = 0; static_cast<int>(dates.size()) < kSeasonMatches; ++week) {
        const sys_days saturday = firstSaturday + days{7 * week};
        dates.push_back(isoDate(saturday));
        if (std::find(midweekAfterWeek.begin(), midweekAfterWeek.end(), week) !=
            midweekAfterWeek.end()) {
            dates.push_back(isoDate(saturday + days{4}));
        }
    }
    return dates;
}

// Planted story: our left-back zone leaks for eight matches, then the staff fix it over three.
double exposureForMatch(int number) {
    if (number <= 8) {
        return 1.0;
    }
    switch (number) {
    case 9:
        return 0.8;
    case 10:
        return 0.55;
    case 11:
        return 0.3;
    default:
        return 0.0;
    }
}

} // namespace

bool isRightFlank(Role role) {
    return role == Role::RightBack || role == Role::RightWingBack || role == Role::RightMid ||
           role == Role::RightWing;
}

bool isForward(Role role) {
    return role == Role::Striker || role == Role::RightWing || role == Role::LeftWing ||
           role == Role::AttackingMid;
}

Season buildSeason(std::uint64_t seed) {
    std::uint64_t sm = seed ^ 0x5EA5'0000'0000'0001ull;
    Rng rng(splitmix64(sm));

    Season season;
    season.club = makeClub();
    for (const auto& op : kOpponents) {
        season.opponents.push_back(makeOpponent(op, rng));
    }

    std::array<int, 17> order{};
    for (int i = 0; i < 17; ++i) {
        order[static_cast<std::size_t>(i)] = i;
    }
    rng.shuffle(std::span<int>(order));

    const auto dates = fixtureDates();
    for (int n = 1; n <= kSeasonMatches; ++n) {
        Fixture fx;
        fx.number = n;
        char id[16];
        std::snprintf(id, sizeof id, "KB-2026-%02d", n);
        fx.id = id;
        fx.date = dates[static_cast<std::size_t>(n - 1)];
        // Second half of the season replays the first-half order with venues swapped, which
        // keeps home and away alternating all season.
        const int round = (n - 1) % 17;
        fx.opponent = order[static_cast<std::size_t>(round)];
        fx.home = (n <= 17) ? (round % 2 == 0) : (round % 2 == 1);
        if (n % 7 == 0) {
            fx.frame = Frame::Ground;
        } else if (n % 5 == 0) {
            fx.frame = Frame::Us;
        } else {
            fx.frame = Frame::Acting;
        }
        fx.leftFlankExposure = exposureForMatch(n);
        season.fixtures.push_back(fx);
    }
    return season;
}

} // namespace pitchloop::demo
