# Regenerating the demo season must reproduce the committed files byte for byte.
# Included from tests/CMakeLists.txt.
add_test(NAME demo_season_regenerates_same_bytes
    COMMAND ${CMAKE_COMMAND}
        -DGEN=$<TARGET_FILE:pitchloop-demo-season>
        -DSRC=${PROJECT_SOURCE_DIR}/sample-club/matches
        -DOUT=${CMAKE_CURRENT_BINARY_DIR}/regen
        -DFIXTURES=${PROJECT_SOURCE_DIR}/sample-club/fixtures.csv
        -P ${PROJECT_SOURCE_DIR}/sample-club/generator/compare_regen.cmake)
