# Regenerates the demo season into OUT and compares it with the committed files in SRC.
#   cmake -DGEN=<pitchloop-demo-season> -DSRC=<sample-club/matches> -DOUT=<scratch dir>
#         [-DSEED=2026] [-DFIXTURES=<sample-club/fixtures.csv>] -P compare_regen.cmake
foreach(var GEN SRC OUT)
    if(NOT DEFINED ${var} OR "${${var}}" STREQUAL "")
        message(FATAL_ERROR "compare_regen.cmake: -D${var}=... is required")
    endif()
endforeach()
if(NOT DEFINED SEED)
    set(SEED 2026)
endif()

file(GLOB expected RELATIVE "${SRC}" "${SRC}/KB-*.json")
list(SORT expected)
list(LENGTH expected expectedCount)
if(expectedCount EQUAL 0)
    message(FATAL_ERROR "no committed match files (KB-*.json) in ${SRC}")
endif()

file(REMOVE_RECURSE "${OUT}")
file(MAKE_DIRECTORY "${OUT}")
execute_process(
    COMMAND "${GEN}" --seed ${SEED} --out "${OUT}" --matches ${expectedCount}
            --fixtures "${OUT}/fixtures.csv"
    RESULT_VARIABLE genResult
    OUTPUT_QUIET
    ERROR_VARIABLE genLog)
if(NOT genResult EQUAL 0)
    message(FATAL_ERROR "generator failed (${genResult}):\n${genLog}")
endif()

file(GLOB produced RELATIVE "${OUT}" "${OUT}/KB-*.json")
list(SORT produced)
if(NOT produced STREQUAL expected)
    message(FATAL_ERROR "regenerated file set differs from ${SRC}:\n"
                        "  committed:   ${expected}\n  regenerated: ${produced}")
endif()

foreach(name IN LISTS expected)
    execute_process(
        COMMAND "${CMAKE_COMMAND}" -E compare_files "${SRC}/${name}" "${OUT}/${name}"
        RESULT_VARIABLE differs)
    if(NOT differs EQUAL 0)
        message(FATAL_ERROR
            "first differing file: ${name}\n"
            "  committed:   ${SRC}/${name}\n"
            "  regenerated: ${OUT}/${name}\n"
            "Regenerate with: pitchloop-demo-season --seed ${SEED} --out sample-club/matches")
    endif()
endforeach()
if(DEFINED FIXTURES AND NOT "${FIXTURES}" STREQUAL "")
    execute_process(
        COMMAND "${CMAKE_COMMAND}" -E compare_files "${FIXTURES}" "${OUT}/fixtures.csv"
        RESULT_VARIABLE differs)
    if(NOT differs EQUAL 0)
        message(FATAL_ERROR "the committed ${FIXTURES} differs from the regenerated schedule\n"
                            "Regenerate with: pitchloop-demo-season --seed ${SEED} "
                            "--out sample-club/matches --fixtures sample-club/fixtures.csv")
    endif()
endif()
message(STATUS "all ${expectedCount} demo match files regenerate byte for byte (seed ${SEED})")
