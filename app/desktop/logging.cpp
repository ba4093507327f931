#include "logging.h"

Q_LOGGING_CATEGORY(lcDesktop, "pitchloop.desktop")
