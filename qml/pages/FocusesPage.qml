pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// Focuses on slipped targets and their follow-up: every focus with its state; one in full with
// the evidence frozen when it opened, its drills, the training time so far, the before/after
// review with its control chart, and the staff's verdict. New focuses open from a flagged zone
// (openFromZone, called by other screens) or from the latest match's slips (Ctrl+N).
Page {
    id: root

    required property ClubSession session
    /// Plain sentences for the coach, or the analyst's numbers (Main.qml, remembered).
    property bool plainWords: true

    /// The moments behind a zone's number (the zone page's second tab).
    signal openMoments(string metricId, int band, int lane, string matchId)

    /// Starts opening a focus on a zone (band 0, lane 0: the whole pitch) flagged after a match.
    function openFromZone(metricId: string, band: int, lane: int, matchId: string) {
        board.openFromZone(metricId, band, lane, matchId)
    }

    background: Rectangle { color: Theme.window }

    FocusView {
        id: board
        session: root.session
    }

    Shortcut {
        sequence: "Ctrl+N"
        enabled: root.visible
        onActivated: board.beginDraft()
    }
    Shortcut {
        sequence: "Ctrl+S"
        enabled: root.visible && board.drafting
        onActivated: board.confirmDraft()
    }
    Shortcut {
        sequence: "Ctrl+F"
        enabled: root.visible
        onActivated: board.drafting ? draft.searchField.forceActiveFocus() : linkSearch.forceActiveFocus()
    }
    Shortcut {
        sequence: "Esc"
        enabled: root.visible && board.drafting
        onActivated: board.cancelDraft()
    }

    RowLayout {
        anchors.fill: parent
        anchors.margins: Theme.margin
        spacing: Theme.gapLarge

        ColumnLayout {
            Layout.preferredWidth: 280
            Layout.maximumWidth: 280
            Layout.fillHeight: true
            spacing: Theme.gap

            Button {
                Layout.fillWidth: true
                text: qsTr("Open a focus… (Ctrl+N)")
                highlighted: true
                enabled: board.hasMatches
                onClicked: board.beginDraft()
            }
            Label {
                Layout.fillWidth: true
                text: board.listText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
            }
            Rectangle {
                Layout.fillWidth: true
                Layout.fillHeight: true
                color: Theme.surface
                radius: Theme.radius
                border.color: Theme.border
                ListView {
                    id: list
                    anchors.fill: parent
                    anchors.margins: 1
                    clip: true
                    model: board.focuses
                    boundsBehavior: Flickable.StopAtBounds
                    ScrollBar.vertical: ScrollBar {}
                    delegate: FocusRowDelegate {
                        selected: !board.drafting && focusId === board.selectedId
                        onClicked: board.select(focusId)
                    }
                }
                Label {
                    visible: list.count === 0
                    anchors.centerIn: parent
                    width: parent.width - 2 * Theme.gapLarge
                    horizontalAlignment: Text.AlignHCenter
                    wrapMode: Text.WordWrap
                    color: Theme.text
                    text: board.hasMatches
                          ? qsTr("No focuses yet. Open one on a zone off target with “Open a focus…” (Ctrl+N), or from a match's debrief.")
                          : qsTr("No matches in this club file yet. A focus opens from a match's flag: load match files first on the “Load matches” page.")
                }
            }
            Label {
                visible: board.statusText.length > 0
                Layout.fillWidth: true
                text: board.statusText
                color: Theme.accent
                font.pixelSize: Theme.fontSmall
                wrapMode: Text.WordWrap
            }
        }

        // Opening a focus
        ScrollView {
            id: draftScroller
            visible: board.drafting
            Layout.fillWidth: true
            Layout.fillHeight: true
            contentWidth: availableWidth
            clip: true
            FocusDraftPanel {
                id: draft
                width: draftScroller.availableWidth - Theme.gap
                view: board
                session: root.session
            }
        }

        // One focus in full
        ScrollView {
            id: detailScroller
            visible: !board.drafting && board.selectedId > 0
            Layout.fillWidth: true
            Layout.fillHeight: true
            contentWidth: availableWidth
            clip: true

            ColumnLayout {
                width: detailScroller.availableWidth - Theme.gap
                spacing: Theme.gap

                RowLayout {
                    Layout.fillWidth: true
                    spacing: Theme.gap
                    FocusStateMarker {
                        phase: board.phase
                        size: 18
                    }
                    Label {
                        text: board.phaseText
                        font.pixelSize: Theme.fontLarge
                        font.bold: true
                        color: Theme.text
                    }
                    Item { Layout.fillWidth: true }
                    Label {
                        text: qsTr("Focus %1").arg(board.selectedId)
                        color: Theme.textMuted
                    }
                }
                Label {
                    Layout.fillWidth: true
                    text: board.title + "  ·  " + board.zonesText
                    font.pixelSize: Theme.fontTitle
                    font.bold: true
                    color: Theme.text
                    wrapMode: Text.WordWrap
                }
                Label {
                    Layout.fillWidth: true
                    text: board.openedText + " " + board.reviewPointText
                    color: Theme.text
                    wrapMode: Text.WordWrap
                }
                Label {
                    visible: board.noteText.length > 0
                    Layout.fillWidth: true
                    text: qsTr("Note: “%1”").arg(board.noteText)
                    color: Theme.textMuted
                    wrapMode: Text.WordWrap
                }

                RowLayout {
                    Layout.fillWidth: true
                    spacing: Theme.gapLarge

                    FocusReviewCard {
                        Layout.fillWidth: true
                        Layout.alignment: Qt.AlignTop
                        view: board
                        plainWords: root.plainWords
                    }

                    ColumnLayout {
                        Layout.preferredWidth: 300
                        Layout.maximumWidth: 300
                        Layout.alignment: Qt.AlignTop
                        spacing: Theme.gapLarge

                        Card {
                            Layout.fillWidth: true
                            title: qsTr("Evidence at opening")
                            Label {
                                Layout.fillWidth: true
                                text: board.evidenceTitle
                                color: Theme.textMuted
                                font.pixelSize: Theme.fontSmall
                                wrapMode: Text.WordWrap
                            }
                            Repeater {
                                model: board.evidence
                                delegate: EvidenceRowDelegate {
                                    Layout.fillWidth: true
                                }
                            }
                            Button {
                                objectName: "evidenceMomentsButton"
                                visible: board.momentsAtOpening.metricId !== undefined
                                text: qsTr("The moments behind it…")
                                onClicked: root.openMoments(board.momentsAtOpening.metricId, board.momentsAtOpening.band,
                                                            board.momentsAtOpening.lane, board.momentsAtOpening.matchId)
                            }
                        }

                        Card {
                            Layout.fillWidth: true
                            title: qsTr("Drills (%1)").arg(board.linked.count)
                            Label {
                                Layout.fillWidth: true
                                text: board.minutesText
                                color: Theme.text
                                font.pixelSize: Theme.fontSmall
                                wrapMode: Text.WordWrap
                            }
                            Repeater {
                                model: board.linked
                                delegate: DrillRowDelegate {
                                    Layout.fillWidth: true
                                    compact: true
                                    actionText: board.closed ? "" : qsTr("Unlink")
                                    onActionClicked: board.unlinkDrill(drillId)
                                }
                            }
                            TextField {
                                id: linkSearch
                                visible: !board.closed
                                Layout.fillWidth: true
                                Layout.topMargin: Theme.gap
                                placeholderText: qsTr("Find a drill to link (Ctrl+F)")
                                text: board.drillQuery
                                onTextEdited: board.drillQuery = text
                            }
                            Label {
                                visible: !board.closed
                                Layout.fillWidth: true
                                text: board.drillSearchText
                                color: Theme.textMuted
                                font.pixelSize: Theme.fontSmall
                                elide: Text.ElideRight
                            }
                            Repeater {
                                model: board.closed ? null : board.drillResults
                                delegate: DrillRowDelegate {
                                    Layout.fillWidth: true
                                    compact: true
                                    actionText: qsTr("Link")
                                    onActionClicked: board.linkDrill(drillId)
                                }
                            }
                        }
                    }
                }
            }
        }

        Item {
            visible: !board.drafting && board.selectedId === 0
            Layout.fillWidth: true
            Layout.fillHeight: true
            Label {
                anchors.centerIn: parent
                width: Math.min(parent.width - 2 * Theme.margin, 560)
                horizontalAlignment: Text.AlignHCenter
                wrapMode: Text.WordWrap
                color: Theme.text
                text: qsTr("A focus turns a target that is off into training work: the metric and zones, drills for it, and a review point. After the review point the page compares the matches before and after it and asks for the staff's verdict.")
            }
        }
    }
}
