pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Dialogs
import QtQuick.Layouts
import Qt.labs.settings
import Pitchloop

// The week planner: seven days around a chosen date with each day's microcycle label, intensity
// cap, fixture and saved session. For the chosen day the planner proposes a session (warm-up,
// main drills, cool-down, each with its reason); the coach pins, leaves out or swaps drills,
// plans again, saves, and exports the session sheet or the week's calendar.
Page {
    id: root

    required property ClubSession session
    /// Plain sentences for the coach, or the analyst's numbers (Main.qml, remembered).
    property bool plainWords: true
    /// The day the form's minutes and players were filled for.
    property string formDate

    function proposeNow() {
        if (!planner.busy)
            planner.propose(minutesField.text, playersField.text)
    }
    function saveNow() {
        if (!planner.hasPlan || planner.busy)
            return
        if (planner.planReplacesSaved)
            replaceDialog.open()
        else
            planner.save(byField.text)
    }
    function exportSheetNow() {
        if (planner.selectedHasSession)
            sheetDialog.open()
    }
    function fillForm() {
        if (planner.selectedDate === formDate)
            return
        formDate = planner.selectedDate
        minutesField.text = planner.suggestedMinutes
        playersField.text = planner.suggestedPlayers
    }

    background: Rectangle { color: Theme.window }

    PlannerView {
        id: planner
        session: root.session
        onDayChanged: root.fillForm()
    }

    Settings {
        category: "planner"
        property alias savedBy: byField.text
        property alias sessionStart: startField.text
    }

    Shortcut {
        sequence: "Ctrl+P"
        enabled: root.visible
        onActivated: root.proposeNow()
    }
    Shortcut {
        sequence: "Ctrl+S"
        enabled: root.visible
        onActivated: root.saveNow()
    }
    Shortcut {
        sequence: "Ctrl+E"
        enabled: root.visible
        onActivated: root.exportSheetNow()
    }

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.margin
        spacing: Theme.gap + 2

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            ColumnLayout {
                Layout.fillWidth: true
                spacing: 0
                Label {
                    text: qsTr("Week planner")
                    font.pixelSize: Theme.fontTitle
                    font.bold: true
                    color: Theme.text
                }
                Label {
                    Layout.fillWidth: true
                    text: planner.weekTitle
                    color: Theme.textMuted
                    elide: Text.ElideRight
                }
            }
            Button {
                text: qsTr("◀ Previous week")
                onClicked: planner.previousWeek()
            }
            Button {
                text: qsTr("Today")
                onClicked: planner.goToToday()
            }
            Button {
                text: qsTr("Next week ▶")
                onClicked: planner.nextWeek()
            }
            Item { Layout.preferredWidth: Theme.gap }
            TextField {
                id: dateField
                Layout.preferredWidth: 120
                placeholderText: qsTr("YYYY-MM-DD")
                onAccepted: planner.goToDate(text)
            }
            Button {
                text: qsTr("Go to date")
                onClicked: planner.goToDate(dateField.text)
            }
        }

        Label {
            visible: planner.dateError.length > 0
            Layout.fillWidth: true
            text: qsTr("Problem: %1").arg(planner.dateError)
            color: Theme.error
            wrapMode: Text.WordWrap
        }
        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            Label {
                visible: planner.weekNote.length > 0
                Layout.fillWidth: true
                text: planner.weekNote
                color: Theme.text
                wrapMode: Text.WordWrap
            }
            Item { Layout.fillWidth: planner.weekNote.length === 0 }
            Button {
                objectName: "editFixture"
                text: planner.selectedFixture.date !== undefined
                      ? qsTr("Edit the fixture on %1…").arg(planner.selectedDayText)
                      : qsTr("Add a fixture on %1…").arg(planner.selectedDayText)
                onClicked: fixtureForm.openFor(planner.selectedFixture)
            }
            Button {
                objectName: "importFixtures"
                text: qsTr("Import fixtures…")
                onClicked: fixturesDialog.open()
            }
        }

        RowLayout {
            Layout.fillWidth: true
            Layout.preferredHeight: 196
            spacing: Theme.gap
            Repeater {
                model: planner.days
                delegate: PlanDayCard {
                    Layout.fillWidth: true
                    Layout.fillHeight: true
                    Layout.preferredWidth: 1
                    onChosen: date => planner.selectDay(date)
                }
            }
        }

        RowLayout {
            Layout.fillWidth: true
            Layout.fillHeight: true
            spacing: Theme.gapLarge

            Card {
                title: qsTr("Plan %1").arg(planner.selectedDayText)
                Layout.preferredWidth: 300
                Layout.fillHeight: true

                Label {
                    Layout.fillWidth: true
                    text: planner.selectedDayDetail
                    color: Theme.text
                    wrapMode: Text.WordWrap
                }
                GridLayout {
                    columns: 2
                    columnSpacing: Theme.gap
                    rowSpacing: 2
                    Label {
                        text: qsTr("Minutes")
                        color: Theme.textMuted
                        font.pixelSize: Theme.fontSmall
                    }
                    Label {
                        text: qsTr("Players available")
                        color: Theme.textMuted
                        font.pixelSize: Theme.fontSmall
                    }
                    TextField {
                        id: minutesField
                        Layout.preferredWidth: 110
                        placeholderText: qsTr("e.g. 75")
                        inputMethodHints: Qt.ImhDigitsOnly
                        onAccepted: root.proposeNow()
                    }
                    TextField {
                        id: playersField
                        Layout.preferredWidth: 110
                        placeholderText: qsTr("e.g. 18")
                        inputMethodHints: Qt.ImhDigitsOnly
                        onAccepted: root.proposeNow()
                    }
                }
                RowLayout {
                    spacing: Theme.gap
                    Button {
                        text: qsTr("Propose  (Ctrl+P)")
                        highlighted: true
                        enabled: !planner.busy
                        onClicked: root.proposeNow()
                    }
                    BusyIndicator {
                        Layout.preferredWidth: 28
                        Layout.preferredHeight: 28
                        running: planner.busy
                        visible: planner.busy
                    }
                    Label {
                        visible: planner.busy
                        text: qsTr("Planning…")
                        color: Theme.textMuted
                    }
                }
                RowLayout {
                    Layout.topMargin: Theme.gap
                    spacing: Theme.gap
                    TextField {
                        id: byField
                        Layout.fillWidth: true
                        placeholderText: qsTr("Saved by (your name)")
                    }
                    Button {
                        text: qsTr("Save  (Ctrl+S)")
                        enabled: planner.hasPlan && !planner.busy
                        onClicked: root.saveNow()
                    }
                }
                Label {
                    Layout.topMargin: Theme.gap
                    text: qsTr("Export")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall + 1
                    font.bold: true
                }
                Button {
                    text: qsTr("Session sheet (PDF)…  (Ctrl+E)")
                    enabled: planner.selectedHasSession
                    onClicked: root.exportSheetNow()
                }
                RowLayout {
                    spacing: Theme.gap
                    Button {
                        text: qsTr("Calendar (.ics)…")
                        onClicked: calendarDialog.open()
                    }
                    Label {
                        text: qsTr("start")
                        color: Theme.textMuted
                    }
                    TextField {
                        id: startField
                        Layout.preferredWidth: 64
                        text: "10:30"
                        placeholderText: qsTr("HH:MM")
                    }
                }
                Label {
                    visible: planner.selectedHasSession
                    Layout.topMargin: Theme.gap
                    text: qsTr("Saved for this day: %1").arg(planner.selectedSessionText)
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall + 1
                    font.bold: true
                }
                Label {
                    visible: planner.selectedHasSession
                    Layout.fillWidth: true
                    text: planner.selectedDrillsText
                    color: Theme.text
                    font.pixelSize: Theme.fontSmall
                    wrapMode: Text.WordWrap
                }
                // Training as held: what really happened, which is what reviews count.
                Label {
                    objectName: "sessionOutcome"
                    visible: planner.selectedOutcomeText.length > 0
                    Layout.fillWidth: true
                    text: planner.selectedOutcomeText
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                    wrapMode: Text.WordWrap
                }
                Flow {
                    visible: planner.selectedCanMark
                    Layout.fillWidth: true
                    spacing: 4
                    TextField {
                        id: presentField
                        objectName: "playersPresent"
                        width: 70
                        placeholderText: qsTr("players")
                        ToolTip.visible: hovered
                        ToolTip.text: qsTr("How many players took part (a count; no per-player load is kept)")
                    }
                    Button {
                        objectName: "markHeld"
                        text: qsTr("Held")
                        onClicked: planner.markSession("held", presentField.text, "", byField.text)
                    }
                    Button {
                        objectName: "markChanged"
                        text: qsTr("Changed…")
                        onClicked: changedDialog.open()
                    }
                    Button {
                        objectName: "markCancelled"
                        text: qsTr("Cancelled")
                        onClicked: planner.markSession("cancelled", "", "", byField.text)
                    }
                }
                Label {
                    Layout.fillWidth: true
                    Layout.fillHeight: true
                    visible: planner.message.length > 0
                    text: planner.messageIsError ? qsTr("Problem: %1").arg(planner.message) : planner.message
                    color: planner.messageIsError ? Theme.error : Theme.text
                    font.pixelSize: Theme.fontSmall
                    wrapMode: Text.Wrap
                    elide: Text.ElideRight
                    verticalAlignment: Text.AlignTop
                }
                Item {
                    visible: planner.message.length === 0
                    Layout.fillHeight: true
                }
            }

            Card {
                title: planner.hasPlan ? qsTr("Proposed session · %1").arg(planner.selectedDayText)
                                       : qsTr("Proposed session")
                Layout.fillWidth: true
                Layout.fillHeight: true

                Label {
                    visible: planner.hasPlan
                    Layout.fillWidth: true
                    text: planner.planSummary
                    color: Theme.text
                    font.bold: true
                    elide: Text.ElideRight
                }
                Label {
                    objectName: "planNotes"
                    visible: planner.hasPlan && planner.planNotes.length > 0
                    Layout.fillWidth: true
                    text: planner.planNotes
                    color: Theme.error
                    wrapMode: Text.WordWrap
                    font.pixelSize: Theme.fontSmall
                }
                Label {
                    visible: !planner.hasPlan && planner.problem.length === 0
                    Layout.fillWidth: true
                    text: qsTr("Choose a day above, type the session's minutes and the players available, and press Propose. The planner picks drills from the drill book for the open focuses, within the day's intensity cap.")
                    color: Theme.textMuted
                    wrapMode: Text.WordWrap
                }
                Label {
                    visible: planner.problem.length > 0
                    Layout.fillWidth: true
                    text: qsTr("Problem: %1").arg(planner.problem)
                    color: Theme.error
                    wrapMode: Text.WordWrap
                }
                Label {
                    visible: planner.notes.length > 0
                    Layout.fillWidth: true
                    text: planner.notes
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                    wrapMode: Text.WordWrap
                }
                RowLayout {
                    visible: planner.hasAdjustments
                    Layout.fillWidth: true
                    Label {
                        Layout.fillWidth: true
                        text: planner.adjustmentsText
                        color: Theme.text
                        font.pixelSize: Theme.fontSmall
                        elide: Text.ElideRight
                    }
                    Button {
                        text: qsTr("Clear changes")
                        flat: true
                        enabled: !planner.busy
                        onClicked: planner.clearAdjustments()
                    }
                }
                ListView {
                    id: blockList
                    Layout.fillWidth: true
                    Layout.fillHeight: true
                    clip: true
                    spacing: 2
                    model: planner.blocks
                    ScrollBar.vertical: ScrollBar {
                        policy: blockList.contentHeight > blockList.height ? ScrollBar.AlwaysOn : ScrollBar.AsNeeded
                    }
                    delegate: PlanBlockDelegate {
                        width: blockList.width - Theme.gap
                        actionsEnabled: !planner.busy
                        onPinToggled: drillId => planner.togglePin(drillId)
                        onLeftOut: drillId => planner.removeDrill(drillId)
                        onSwapAsked: (drillId, title) => swapDialog.ask(drillId, title)
                    }
                }
                Label {
                    visible: planner.focusMinutes.count > 0
                    text: qsTr("Minutes per open focus, most severe first")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall + 1
                    font.bold: true
                }
                Repeater {
                    model: planner.focusMinutes
                    delegate: PlanFocusDelegate {
                        Layout.fillWidth: true
                    }
                }
                Label {
                    Layout.fillWidth: true
                    Layout.topMargin: Theme.gapSmall
                    text: qsTr("Caution: %1").arg(planner.caution)
                    color: Theme.text
                    font.pixelSize: Theme.fontSmall
                    font.italic: true
                    wrapMode: Text.WordWrap
                }
            }
        }
    }

    PlanSwapDialog {
        id: swapDialog
        choices: planner.drillChoices
        onSwapChosen: (outId, inId) => planner.swapDrill(outId, inId)
    }

    Dialog {
        id: replaceDialog
        title: qsTr("Replace the saved session?")
        modal: true
        width: 460
        anchors.centerIn: parent
        standardButtons: Dialog.Yes | Dialog.Cancel
        onAccepted: planner.save(byField.text)
        Label {
            width: parent.width
            text: qsTr("%1 already has a saved session. Saving replaces it with the proposed one.").arg(planner.selectedDayText)
            wrapMode: Text.WordWrap
        }
    }

    FileDialog {
        id: sheetDialog
        title: qsTr("Save the session sheet")
        fileMode: FileDialog.SaveFile
        defaultSuffix: "pdf"
        nameFilters: [qsTr("PDF files (*.pdf)")]
        onAccepted: planner.exportSheet(selectedFile)
    }

    Dialog {
        id: changedDialog
        title: qsTr("The session as it was held")
        modal: true
        width: 460
        anchors.centerIn: parent
        standardButtons: Dialog.Save | Dialog.Cancel
        onAccepted: planner.markSession("changed", presentField.text, changedMinutes.text, byField.text)
        ColumnLayout {
            width: parent.width
            Label {
                Layout.fillWidth: true
                text: qsTr("The minutes each block really took, in the saved order (0 for a block left out):\n%1").arg(planner.selectedDrillsText)
                wrapMode: Text.WordWrap
            }
            TextField { id: changedMinutes; Layout.fillWidth: true; placeholderText: qsTr("e.g. 10 12 0 10") }
        }
    }

    // One fixture, added or edited in place: date, kick-off, opponent, venue, competition.
    Dialog {
        id: fixtureForm
        objectName: "fixtureForm"
        property string originalDate
        function openFor(fixture) {
            originalDate = fixture.date !== undefined ? fixture.date : ""
            fixtureDate.text = fixture.date !== undefined ? fixture.date : planner.selectedDate
            fixtureKickoff.text = fixture.kickoff !== undefined ? fixture.kickoff : ""
            fixtureOpponent.text = fixture.opponent !== undefined ? fixture.opponent : ""
            fixtureVenue.currentIndex = Math.max(0, ["home", "away", "neutral"].indexOf(fixture.venue !== undefined ? fixture.venue : "home"))
            fixtureCompetition.text = fixture.competition !== undefined ? fixture.competition : ""
            open()
        }
        title: originalDate.length > 0 ? qsTr("Edit the fixture") : qsTr("Add a fixture")
        modal: true
        width: 440
        anchors.centerIn: parent
        standardButtons: Dialog.Save | Dialog.Cancel
        onAccepted: planner.saveFixture(originalDate, fixtureDate.text, fixtureKickoff.text, fixtureOpponent.text,
                                        ["home", "away", "neutral"][fixtureVenue.currentIndex], fixtureCompetition.text)
        GridLayout {
            width: parent.width
            columns: 2
            columnSpacing: Theme.gap
            Label { text: qsTr("Date"); color: Theme.textMuted }
            TextField { id: fixtureDate; Layout.fillWidth: true; placeholderText: "YYYY-MM-DD" }
            Label { text: qsTr("Kick-off"); color: Theme.textMuted }
            TextField { id: fixtureKickoff; Layout.fillWidth: true; placeholderText: qsTr("HH:MM, or empty while unknown") }
            Label { text: qsTr("Opponent"); color: Theme.textMuted }
            TextField { id: fixtureOpponent; Layout.fillWidth: true }
            Label { text: qsTr("Venue"); color: Theme.textMuted }
            ComboBox { id: fixtureVenue; Layout.fillWidth: true; model: [qsTr("Home"), qsTr("Away"), qsTr("Neutral ground")] }
            Label { text: qsTr("Competition"); color: Theme.textMuted }
            TextField { id: fixtureCompetition; Layout.fillWidth: true; placeholderText: qsTr("League, Cup… (optional)") }
            Button {
                Layout.columnSpan: 2
                visible: fixtureForm.originalDate.length > 0
                text: qsTr("Remove this fixture")
                onClicked: {
                    planner.removeFixture(fixtureForm.originalDate)
                    fixtureForm.close()
                }
            }
        }
    }

    FileDialog {
        id: fixturesDialog
        title: qsTr("Import the squad's fixtures")
        fileMode: FileDialog.OpenFile
        nameFilters: [qsTr("Fixtures (*.csv *.json)"), qsTr("All files (*)")]
        onAccepted: planner.importFixtures(selectedFile)
    }

    FileDialog {
        id: calendarDialog
        title: qsTr("Save the week's calendar")
        fileMode: FileDialog.SaveFile
        defaultSuffix: "ics"
        nameFilters: [qsTr("Calendar files (*.ics)")]
        onAccepted: planner.exportCalendar(selectedFile, startField.text)
    }

    Component.onCompleted: fillForm()
}
