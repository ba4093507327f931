#include "intensitycapmodel.h"

#include "drills.h"

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

/// Row order: MD-4, MD-3, MD-2, MD-1, MD, MD+1, MD+2, other days.
int capAt(const IntensityCaps& caps, int row) {
    if (row < 4) return caps.before(4 - row);
    if (row == 4) return caps.matchDay;
    if (row < 7) return caps.after(row - 4);
    return caps.otherDays;
}

void setCapAt(IntensityCaps& caps, int row, int value) {
    if (row < 4) caps.beforeMatch[static_cast<std::size_t>(4 - row - 1)] = value;
    else if (row == 4) caps.matchDay = value;
    else if (row < 7) caps.afterMatch[static_cast<std::size_t>(row - 5)] = value;
    else caps.otherDays = value;
}

} // namespace

IntensityCapModel::IntensityCapModel(QObject* parent) : QAbstractListModel(parent) {}

void IntensityCapModel::load(const IntensityCaps& stored) {
    beginResetModel();
    for (int row = 0; row < kDays; ++row) {
        m_stored[row] = capAt(stored, row);
        m_texts[row] = QString::number(m_stored[row]);
    }
    m_loaded = true;
    endResetModel();
}

QStringList IntensityCapModel::texts() const {
    QStringList out;
    for (const auto& t : m_texts) out << t;
    return out;
}

void IntensityCapModel::setTexts(const QStringList& texts) {
    for (int row = 0; row < kDays && row < texts.size(); ++row) setText(row, texts[row]);
}

std::optional<int> IntensityCapModel::typedCap(int row) const {
    if (row < 0 || row >= kDays) return std::nullopt;
    bool ok = false;
    const int value = m_texts[row].trimmed().toInt(&ok);
    return ok ? std::optional(value) : std::nullopt;
}

IntensityCaps IntensityCapModel::typedCaps(const IntensityCaps& fallback) const {
    IntensityCaps caps = fallback;
    for (int row = 0; row < kDays; ++row)
        if (const auto v = typedCap(row)) setCapAt(caps, row, *v);
    return caps;
}

int IntensityCapModel::rowOfField(const std::string& field) {
    if (field == "md") return 4;
    if (field == "other") return 7;
    if (field.rfind("md_plus[", 0) == 0 && field.size() == 10) {
        const int i = field[8] - '0'; // md_plus[0] is MD+1
        return i >= 0 && i < kRecoveryDays ? 5 + i : -1;
    }
    if (field.rfind("md_minus[", 0) == 0 && field.size() == 11) {
        const int i = field[9] - '0'; // md_minus[0] is MD-1
        return i >= 0 && i < 4 ? 3 - i : -1;
    }
    return -1;
}

QString IntensityCapModel::dayAt(int row) const {
    static const char* const days[kDays] = {"MD-4", "MD-3", "MD-2", "MD-1",
                                            "MD",   "MD+1", "MD+2", nullptr};
    if (row < 0 || row >= kDays) return {};
    return days[row] ? QString::fromLatin1(days[row]) : tr("Other days");
}

bool IntensityCapModel::setText(int row, const QString& text) {
    return setData(index(row, 0), text, TextRole);
}

int IntensityCapModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() || !m_loaded ? 0 : kDays;
}

QVariant IntensityCapModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const int row = index.row();
    const auto typed = typedCap(row);
    const bool valid = typed && *typed >= 0 && *typed <= kIntensityMax;
    switch (role) {
    case Qt::DisplayRole:
    case DayRole: return dayAt(row);
    case ExplanationRole: {
        static const char* const what[kDays] = {
            QT_TR_NOOP("four days before a match"), QT_TR_NOOP("three days before"),
            QT_TR_NOOP("two days before"),          QT_TR_NOOP("the day before a match"),
            QT_TR_NOOP("match day"),                QT_TR_NOOP("the day after a match"),
            QT_TR_NOOP("two days after"),
            QT_TR_NOOP("MD-5 and earlier; after the last fixture")};
        return tr(what[row]);
    }
    case Qt::EditRole:
    case TextRole: return m_texts[row];
    case NameRole:
        if (!valid) return tr("type 0 to 5");
        return *typed < kIntensityMin ? tr("no session")
                                      : QString::fromStdString(std::string(intensityName(*typed)));
    case ValidRole: return valid;
    case StoredRole: return m_stored[row];
    case DefaultRole: return capAt(IntensityCaps{}, row);
    default: return {};
    }
}

bool IntensityCapModel::setData(const QModelIndex& index, const QVariant& value, int role) {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return false;
    if (role != TextRole && role != Qt::EditRole) return false;
    const QString text = value.toString();
    if (m_texts[index.row()] == text) return true;
    m_texts[index.row()] = text;
    emit dataChanged(index, index, {TextRole, Qt::EditRole, NameRole, ValidRole});
    return true;
}

Qt::ItemFlags IntensityCapModel::flags(const QModelIndex& index) const {
    if (!index.isValid()) return Qt::NoItemFlags;
    return Qt::ItemIsEnabled | Qt::ItemIsSelectable | Qt::ItemIsEditable | Qt::ItemNeverHasChildren;
}

QHash<int, QByteArray> IntensityCapModel::roleNames() const {
    return {{DayRole, "day"},     {ExplanationRole, "explanation"}, {TextRole, "capText"},
            {NameRole, "capName"},   {ValidRole, "valid"},             {StoredRole, "stored"},
            {DefaultRole, "defaultCap"}};
}

} // namespace pitchloop::desktop
