# Builds a fresh club file for the desktop self-test from the demo club's files (matches,
# targets, drills, fixtures, the story's focus and a planned week: sample-club/prepare.cmake).
# Run with cmake -DCLI=... -DSOURCE=... -DCLUB=... -P.
file(REMOVE ${CLUB} ${CLUB}-wal ${CLUB}-shm)
include(${SOURCE}/sample-club/prepare.cmake)
