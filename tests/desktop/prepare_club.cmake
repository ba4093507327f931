# Builds a fresh club file for the desktop self-test: the demo season's matches and targets,
# ingested with the command line. Run with cmake -DCLI=... -DSOURCE=... -DCLUB=... -P.
file(REMOVE ${CLUB} ${CLUB}-wal ${CLUB}-shm)
get_filename_component(dir ${CLUB} DIRECTORY)
file(MAKE_DIRECTORY ${dir})
file(GLOB matches ${SOURCE}/sample-club/matches/*.json)
execute_process(COMMAND ${CLI} --db ${CLUB} ingest ${matches} RESULT_VARIABLE rc OUTPUT_QUIET)
if(NOT rc EQUAL 0)
  message(FATAL_ERROR "ingest of the demo matches failed (${rc})")
endif()
execute_process(COMMAND ${CLI} --db ${CLUB} targets import ${SOURCE}/sample-club/targets.json
                RESULT_VARIABLE rc OUTPUT_QUIET)
if(NOT rc EQUAL 0)
  message(FATAL_ERROR "import of the demo targets failed (${rc})")
endif()
