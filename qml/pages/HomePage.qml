pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The squad's season at a glance: the last match, what slipped over the judged window, how many
// zones were judged, and how many flags chance alone would raise.
Page {
    id: root

    required property ClubSession session
    /// Plain sentences for the coach, or the analyst's numbers (Main.qml, remembered).
    property bool plainWords: true

    signal openDebrief(string matchId)
    signal openZone(string metricId, int band, int lane, string matchId)
    signal openPage(string name)

    background: Rectangle { color: Theme.window }

    SeasonOverview {
        id: overview
        session: root.session
    }

    ClubAgenda {
        id: agenda
        session: root.session
    }

    // A card of the "coming up" row: a headline, a detail line, and a button to its screen.
    component AgendaCard: Card {
        id: card
        property string headline
        property string detail
        property string action
        property string page
        Layout.fillWidth: true
        Layout.preferredWidth: 1
        Layout.preferredHeight: 136
        Label {
            Layout.fillWidth: true
            text: card.headline
            font.pixelSize: Theme.fontLarge
            font.bold: true
            color: Theme.text
            elide: Text.ElideRight
        }
        Label {
            Layout.fillWidth: true
            text: card.detail
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall + 1
            wrapMode: Text.WordWrap
            maximumLineCount: 2
            elide: Text.ElideRight
        }
        Button {
            text: card.action
            flat: true
            palette.buttonText: Theme.accent
            onClicked: root.openPage(card.page)
        }
    }

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.margin
        spacing: Theme.gapLarge

        RowLayout {
            Layout.fillWidth: true
            ColumnLayout {
                spacing: 2
                Label {
                    text: root.session.clubName.length > 0 ? root.session.clubName : qsTr("Your club")
                    font.pixelSize: Theme.fontHeading
                    font.bold: true
                    color: Theme.text
                }
                Label {
                    text: overview.hasMatches
                          ? qsTr("%1 · %2 matches stored").arg(overview.squadText).arg(overview.seasonMatchCount)
                            + (root.session.matchesAfterToday > 0
                               ? qsTr(" · %1 dated after today, left out of “last match”").arg(root.session.matchesAfterToday)
                               : "")
                          : qsTr("No matches stored yet")
                    color: Theme.textMuted
                }
            }
            Item { Layout.fillWidth: true }
            Button {
                visible: overview.hasMatches
                text: qsTr("Debrief the last match")
                palette.button: Theme.accent
                palette.buttonText: "#ffffff"
                enabled: overview.hasMatches
                onClicked: root.openDebrief(overview.lastMatchId)
            }
        }

        Label {
            visible: !overview.hasMatches
            Layout.fillWidth: true
            wrapMode: Text.WordWrap
            text: qsTr("This club file holds no matches yet. Load them on the Load matches page (Ctrl+2), or drop the files on this window.")
            color: Theme.text
        }

        RowLayout {
            visible: overview.hasMatches
            Layout.fillWidth: true
            spacing: Theme.gapLarge

            Card {
                title: qsTr("Last match")
                Layout.fillWidth: true
                Layout.preferredWidth: 1
                Layout.preferredHeight: 172
                Label {
                    text: qsTr("v %1").arg(overview.lastOpponent)
                    font.pixelSize: Theme.fontTitle
                    font.bold: true
                    color: Theme.text
                }
                Label {
                    text: overview.lastVenue + " · " + overview.lastDateText
                    color: Theme.textMuted
                }
                RowLayout {
                    spacing: Theme.gapLarge
                    Label {
                        text: overview.lastScore.length > 0 ? overview.lastScore : qsTr("no score")
                        font.pixelSize: Theme.fontDisplay
                        font.bold: true
                        color: Theme.text
                    }
                    Label {
                        text: overview.lastOutcomeWord
                        font.pixelSize: Theme.fontLarge
                        color: Theme.textMuted
                    }
                }
                Label {
                    text: overview.lastMatchId + (overview.lastCompetition.length > 0 ? " · " + overview.lastCompetition : "")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                }
            }

            Card {
                title: qsTr("Judged window")
                Layout.fillWidth: true
                Layout.preferredWidth: 1
                Layout.preferredHeight: 172
                Label {
                    text: overview.windowText
                    font.pixelSize: Theme.fontTitle
                    font.bold: true
                    color: Theme.text
                }
                Label {
                    text: overview.windowRangeText
                    color: Theme.textMuted
                }
                RowLayout {
                    visible: overview.hasTargets
                    spacing: Theme.margin
                    FigureTile { value: overview.judged; caption: qsTr("zones judged") }
                    FigureTile {
                        value: overview.tooLittleData
                        caption: qsTr("too little data")
                        zoneState: ZoneState.TooLittleData
                    }
                }
                Label {
                    visible: !overview.hasTargets
                    Layout.fillWidth: true
                    wrapMode: Text.WordWrap
                    text: qsTr("No targets set for this season yet.")
                    color: Theme.text
                }
            }

            Card {
                title: qsTr("Flags over the window")
                Layout.fillWidth: true
                Layout.preferredWidth: 1.4
                Layout.preferredHeight: 172
                Label {
                    visible: !overview.hasTargets
                    Layout.fillWidth: true
                    wrapMode: Text.WordWrap
                    text: qsTr("Nothing is judged without targets.")
                    color: Theme.text
                }
                RowLayout {
                    visible: overview.hasTargets
                    spacing: Theme.margin
                    FigureTile { value: overview.slippedCount; caption: qsTr("off target"); zoneState: ZoneState.OffTarget }
                    FigureTile { value: overview.watchCount; caption: qsTr("likely off or close"); zoneState: ZoneState.CloseToLine }
                    FigureTile { value: overview.recoveredCount; caption: qsTr("back on target"); zoneState: ZoneState.OnTarget }
                }
                Label {
                    Layout.fillWidth: true
                    wrapMode: Text.WordWrap
                    text: root.plainWords ? overview.plainChanceText : overview.chanceText
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                }
            }
        }

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gapLarge

            AgendaCard {
                title: qsTr("Next match")
                headline: agenda.nextMatchText
                detail: agenda.nextMatchDetail
                action: qsTr("Plan the week →")
                page: "planner"
            }
            AgendaCard {
                title: qsTr("Next planned session")
                headline: agenda.nextSessionText
                detail: agenda.nextSessionDetail
                action: qsTr("Open the week planner →")
                page: "planner"
            }
            AgendaCard {
                title: qsTr("Focuses (today is %1)").arg(agenda.todayText)
                Layout.preferredWidth: 1.4
                headline: agenda.openFocusCount + agenda.dueCount === 0
                          ? qsTr("No open focus")
                          : qsTr("%n open", "", agenda.openFocusCount)
                            + (agenda.dueCount > 0 ? qsTr(" · %n due for review", "", agenda.dueCount) : "")
                detail: agenda.focusLines.length > 0 ? agenda.focusLines[0]
                        : qsTr("Open one from a zone off target in the match debrief")
                action: qsTr("Focuses and reviews →")
                page: "focuses"
            }
        }

        DebriefListCard {
            visible: overview.hasMatches
            title: qsTr("What the last match's debrief says, most certain first")
            Layout.fillWidth: true
            Layout.fillHeight: true
            lines: overview.items
            plainWords: root.plainWords
            emptyText: overview.hasTargets
                       ? qsTr("Nothing off target, on watch or back on target over %1.").arg(overview.windowText.toLowerCase())
                       : qsTr("No targets are set for this season, so the debrief has nothing to judge. "
                              + "Set them on the Season targets page (Ctrl+3).")
            onLineClicked: (metricId, band, lane) => root.openZone(metricId, band, lane, overview.lastMatchId)
        }

        Item {
            visible: !overview.hasMatches
            Layout.fillHeight: true
        }

        Label {
            visible: overview.hasTargets
            text: qsTr("Flags are evidence for the staff to weigh, not verdicts. Click a line for its zone trend.")
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
        }
    }
}
