#pragma once
// The one place where a storage fault of SQLiteCpp becomes our StorageError, saying what was
// being done ("cannot save the profile: database is locked").

#include "problem.h"

#include <SQLiteCpp/Exception.h>

#include <string>

namespace pitchloop::model {

/// Runs `f`, turning SQLite::Exception into StorageError("what: reason").
template <typename F>
auto guarded(const char* what, F&& f) -> decltype(f()) {
    try {
        return f();
    } catch (const SQLite::Exception& e) {
        throw StorageError(std::string(what) + ": " + e.what());
    }
}

} // namespace pitchloop::model
