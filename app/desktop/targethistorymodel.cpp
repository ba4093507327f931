#include "targethistorymodel.h"

#include "display.h"

#include <QDateTime>
#include <QLocale>

#include <algorithm>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

/// "2 Dec 2026, 01:04 UTC" from "2026-12-02T01:04:00Z"; the text unchanged when unreadable.
QString stampText(const std::string& iso) {
    const QDateTime t = QDateTime::fromString(QString::fromStdString(iso), Qt::ISODate);
    if (!t.isValid()) return QString::fromStdString(iso);
    return compactDateText(iso.substr(0, 10)) + QStringLiteral(", ") +
           t.toUTC().toString(QStringLiteral("HH:mm")) + QStringLiteral(" UTC");
}

} // namespace

std::vector<TargetHistoryRow> historyRows(const std::vector<Target>& versions, MetricKind kind,
                                          const std::string& asOf) {
    std::vector<const Target*> order;
    for (const auto& t : versions) order.push_back(&t);
    std::sort(order.begin(), order.end(), [](const Target* a, const Target* b) {
        if (a->recordedAt != b->recordedAt) return a->recordedAt > b->recordedAt;
        return a->version > b->version;
    });
    const auto current = inForce(versions, asOf);
    std::vector<TargetHistoryRow> rows;
    for (const Target* t : order) {
        TargetHistoryRow r;
        r.recordedText = stampText(t->recordedAt);
        r.effectiveText = QStringLiteral("from %1").arg(compactDateText(t->effectiveFrom));
        r.author = QString::fromStdString(t->author);
        r.retired = t->retired;
        r.ruleText = t->retired ? QStringLiteral("Retired")
                                : QStringLiteral("%1 · margin %2 · min. sample %3")
                                      .arg(targetText(kind, *t), valueText(kind, t->watchMargin),
                                           QLocale().toString(static_cast<qlonglong>(t->minSample)));
        r.rationale = QString::fromStdString(t->rationale);
        r.inForce = current && current->version == t->version;
        rows.push_back(std::move(r));
    }
    return rows;
}

TargetHistoryModel::TargetHistoryModel(QObject* parent) : QAbstractListModel(parent) {}

void TargetHistoryModel::reset(std::vector<TargetHistoryRow> rows) {
    const bool countChange = rows.size() != m_rows.size();
    beginResetModel();
    m_rows = std::move(rows);
    endResetModel();
    if (countChange) emit countChanged();
}

int TargetHistoryModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant TargetHistoryModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const TargetHistoryRow& r = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case RecordedTextRole: return r.recordedText;
    case EffectiveTextRole: return r.effectiveText;
    case AuthorRole: return r.author;
    case Qt::DisplayRole:
    case RuleTextRole: return r.ruleText;
    case RationaleRole: return r.rationale;
    case RetiredRole: return r.retired;
    case InForceRole: return r.inForce;
    default: return {};
    }
}

QHash<int, QByteArray> TargetHistoryModel::roleNames() const {
    return {{RecordedTextRole, "recordedText"}, {EffectiveTextRole, "effectiveText"},
            {AuthorRole, "author"},             {RuleTextRole, "ruleText"},
            {RationaleRole, "rationale"},       {RetiredRole, "retired"},
            {InForceRole, "inForce"}};
}

} // namespace pitchloop::desktop
