# Prepares the demo club file from this folder with the command line, the way a staff would:
# the season's matches, targets, drill book and fixtures, the planted story's focus, and a week
# of planned sessions around it. Idempotent: an identical file is a no-op, and the focus and
# sessions are added only while the club file has none, so edits made in the demo club stay.
#   cmake -DCLI=<build>/app/cli/pitchloop -DCLUB=<club.sqlite> -P sample-club/prepare.cmake
foreach(var CLI CLUB)
    if(NOT DEFINED ${var} OR "${${var}}" STREQUAL "")
        message(FATAL_ERROR "prepare.cmake: -D${var}=... is required")
    endif()
endforeach()
set(here ${CMAKE_CURRENT_LIST_DIR})
get_filename_component(dir ${CLUB} DIRECTORY)
file(MAKE_DIRECTORY ${dir})

function(club)
    execute_process(COMMAND ${CLI} --db ${CLUB} ${ARGN}
                    RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
    if(NOT rc EQUAL 0)
        string(REPLACE ";" " " words "${ARGN}")
        message(FATAL_ERROR "pitchloop ${words} failed (${rc}):\n${err}")
    endif()
    set(club_out "${out}" PARENT_SCOPE)
endfunction()

file(GLOB matches ${here}/matches/*.json)
list(SORT matches)
club(ingest ${matches})
club(targets import ${here}/targets.json)
club(drills import ${here}/drills.json)
club(fixtures import ${here}/fixtures.csv)
# The squad list (invented names; the numbers and positions the simulator plays them in), only
# while the club file has none, so a list edited in the demo club stays.
club(squad list)
if(club_out STREQUAL "")
    club(squad import ${here}/squad.csv)
endif()

# The story's focus: opened after match 8 on the slipped left-back zone, with three of the
# drill book's drills for it (ids 6, 7 and 9 in drills.json's order). The focus and the week's
# sessions are written as on Sun 27 Sep 2026, the day after that match ($PITCHLOOP_TODAY).
set(ENV{PITCHLOOP_TODAY} 2026-09-27)
club(focus list --format json)
string(STRIP "${club_out}" focuses)
if(focuses STREQUAL "[]")
    club(focus open --match KB-2026-08 --metric pre_shot_passes_against --zone 2,5
         --drill 6 --drill 7 --drill 9 --by "D. Arkwright (head coach)"
         --note "their right side keeps overloading our left back")
endif()

# The week after match 8 (Sat 26 Sep) up to match 9 (Sat 3 Oct), planned around that focus:
# date and minutes; 18 players each day.
club(sessions --format json)
string(STRIP "${club_out}" sessions)
if(sessions STREQUAL "[]")
    foreach(day 2026-09-28:50 2026-09-29:90 2026-09-30:75 2026-10-01:60 2026-10-02:45)
        string(REPLACE ":" ";" parts ${day})
        list(GET parts 0 date)
        list(GET parts 1 minutes)
        club(plan ${date} --minutes ${minutes} --players 18 --save
             --by "D. Arkwright (head coach)")
    endforeach()
    # How the week went, recorded on Sat 3 Oct: four sessions held (players who took part),
    # Friday's cancelled; reviews count the minutes held (docs/planner.md, "Training as held").
    set(ENV{PITCHLOOP_TODAY} 2026-10-03)
    foreach(day 2026-09-28:17 2026-09-29:18 2026-09-30:16 2026-10-01:18)
        string(REPLACE ":" ";" parts ${day})
        list(GET parts 0 date)
        list(GET parts 1 players)
        club(sessions mark ${date} --outcome held --players ${players} --by "R. Tamsin (analyst)")
    endforeach()
    club(sessions mark 2026-10-02 --outcome cancelled --by "R. Tamsin (analyst)")
endif()
unset(ENV{PITCHLOOP_TODAY})
message(STATUS "demo club ready: ${CLUB}")
