#include "problem.h"

namespace pitchloop::model {

std::string Problem::describe() const {
    std::string out = file;
    if (!place.empty() || !field.empty()) {
        out += ": ";
        out += place;
        if (!place.empty() && !field.empty()) out += '.';
        out += field;
    }
    out += ": ";
    out += message;
    return out;
}

std::string describeAll(const Problems& problems) {
    std::string out;
    for (const auto& p : problems) {
        out += p.describe();
        out += '\n';
    }
    return out;
}

} // namespace pitchloop::model
