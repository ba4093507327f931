pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Dialogs
import QtQuick.Layouts
import Pitchloop

// The club's settings: which club file is open (and opening another), the zone grid, how zones
// are judged (window, interval, thresholds, false discovery rate) and the intensity cap of each
// microcycle day. A save is checked first and can be undone.
Page {
    id: root

    required property ClubSession session
    /// Plain sentences for the coach, or the analyst's numbers (Main.qml, remembered).
    property bool plainWords: true
    /// The staff member picked the layer of words the screens open in.
    signal plainWordsChosen(bool plain)

    background: Rectangle { color: Theme.window }

    SettingsView {
        id: settings
        session: root.session
    }
    GridChangeView {
        id: gridView
        objectName: "gridView"
        session: root.session
    }

    Shortcut {
        sequence: "Ctrl+S"
        enabled: root.visible
        onActivated: settings.save()
    }
    Shortcut {
        sequence: "Ctrl+Z"
        enabled: root.visible && settings.canUndo
        onActivated: settings.undo()
    }

    FileDialog {
        id: openDialog
        title: qsTr("Open another club file")
        fileMode: FileDialog.OpenFile
        nameFilters: [qsTr("Club files (*.sqlite *.db)"), qsTr("All files (*)")]
        onAccepted: settings.openClubFile(selectedFile)
    }

    SquadListView {
        id: squadListView
        session: root.session
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
                    text: qsTr("Settings")
                    font.pixelSize: Theme.fontTitle
                    font.bold: true
                    color: Theme.text
                }
                Label {
                    Layout.fillWidth: true
                    text: settings.ruleText
                    color: Theme.textMuted
                    wrapMode: Text.WordWrap
                }
            }
            Button {
                text: qsTr("Undo last save  (Ctrl+Z)")
                enabled: settings.canUndo
                onClicked: settings.undo()
            }
            Button {
                text: qsTr("Revert")
                enabled: settings.edited
                onClicked: settings.revert()
            }
            Button {
                text: qsTr("Save settings  (Ctrl+S)")
                highlighted: true
                enabled: root.session.isOpen
                onClicked: settings.save()
            }
        }

        Label {
            visible: settings.problems.length > 0
            Layout.fillWidth: true
            text: qsTr("Problem: %1").arg(settings.problems)
            color: Theme.error
            wrapMode: Text.WordWrap
        }
        Label {
            visible: settings.message.length > 0
            Layout.fillWidth: true
            text: settings.message
            color: Theme.text
            wrapMode: Text.WordWrap
        }

        RowLayout {
            Layout.fillWidth: true
            Layout.fillHeight: true
            spacing: Theme.gapLarge

            ColumnLayout {
                Layout.fillWidth: true
                Layout.fillHeight: true
                spacing: Theme.gapLarge

                Card {
                    title: qsTr("Club file")
                    Layout.fillWidth: true
                    RowLayout {
                        Layout.fillWidth: true
                        spacing: Theme.gap
                        Label {
                            Layout.fillWidth: true
                            text: root.session.clubFile.length > 0 ? root.session.clubFile : qsTr("No club file is open.")
                            color: Theme.text
                            elide: Text.ElideMiddle
                        }
                        Button {
                            text: qsTr("Open another club file…")
                            onClicked: openDialog.open()
                        }
                    }
                    Label {
                        Layout.fillWidth: true
                        text: (root.session.demo ? qsTr("This is the demo club (invented data). ") : "")
                              + qsTr("A club file opened here opens again at the next start.")
                        color: Theme.textMuted
                        font.pixelSize: Theme.fontSmall
                        wrapMode: Text.WordWrap
                    }
                    Label {
                        Layout.topMargin: Theme.gap
                        Layout.fillWidth: true
                        text: qsTr("Zone grid: %1").arg(settings.gridText)
                        color: Theme.text
                        elide: Text.ElideRight
                    }
                }

                Card {
                    title: qsTr("Words on the screens")
                    Layout.fillWidth: true
                    SettingsRow {
                        Layout.fillWidth: true
                        label: qsTr("Screens open in")
                        explanation: qsTr("Plain words: each zone in a sentence, its numbers when you hover it. Numbers: values, intervals and P(miss) in columns, the sentence when you hover it. Kept on this computer; the switch at the bottom of the side bar changes it too.")
                        defaultText: qsTr("Default: plain words")
                        ComboBox {
                            objectName: "wordLayer"
                            Layout.preferredWidth: 190
                            model: [qsTr("Plain words"), qsTr("Numbers")]
                            currentIndex: root.plainWords ? 0 : 1
                            onActivated: index => root.plainWordsChosen(index === 0)
                        }
                    }
                }

                Card {
                    title: qsTr("How zones are judged (docs/statistics.md)")
                    Layout.fillWidth: true
                    Layout.fillHeight: true

                    SettingsRow {
                        Layout.fillWidth: true
                        label: qsTr("Judged window")
                        explanation: qsTr("The matches a debrief judges, ending at the match.")
                        defaultText: settings.windowDefault
                        ComboBox {
                            Layout.preferredWidth: 190
                            model: [qsTr("Last N matches"), qsTr("Season so far"), qsTr("EWMA"), qsTr("This match alone")]
                            currentIndex: settings.windowKind
                            onActivated: index => settings.windowKind = index
                        }
                        Label {
                            visible: settings.windowKind === 0 || settings.windowKind === 2
                            text: settings.windowKind === 0 ? qsTr("N") : qsTr("λ")
                            color: Theme.textMuted
                        }
                        TextField {
                            visible: settings.windowKind === 0
                            Layout.preferredWidth: 64
                            text: settings.windowNText
                            onTextEdited: settings.windowNText = text
                        }
                        TextField {
                            visible: settings.windowKind === 2
                            Layout.preferredWidth: 64
                            text: settings.lambdaText
                            onTextEdited: settings.lambdaText = text
                        }
                    }
                    SettingsRow {
                        Layout.fillWidth: true
                        label: qsTr("Interval level")
                        explanation: qsTr("Confidence of the interval around every value; Wilson or Jeffreys for rates (counts: exact Poisson).")
                        defaultText: settings.levelDefault
                        TextField {
                            Layout.preferredWidth: 90
                            text: settings.levelText
                            onTextEdited: settings.levelText = text
                        }
                        ComboBox {
                            Layout.preferredWidth: 190
                            model: [qsTr("Wilson (rates)"), qsTr("Jeffreys (rates)")]
                            currentIndex: settings.intervalMethod
                            onActivated: index => settings.intervalMethod = index
                        }
                    }
                    SettingsRow {
                        Layout.fillWidth: true
                        label: qsTr("False flags a season")
                        explanation: qsTr("About how many zones truly on target you accept to see called off in a season, across every metric and zone with a target (each zone at most 5 %). 0 uses the fixed threshold below.")
                        defaultText: settings.budgetDefault
                        TextField {
                            objectName: "budget"
                            Layout.preferredWidth: 60
                            text: settings.budgetText
                            onTextEdited: settings.budgetText = text
                        }
                        Label {
                            text: qsTr("over")
                            color: Theme.textMuted
                        }
                        TextField {
                            objectName: "seasonMatches"
                            Layout.preferredWidth: 50
                            text: settings.seasonMatchesText
                            onTextEdited: settings.seasonMatchesText = text
                        }
                        Label {
                            text: qsTr("matches")
                            color: Theme.textMuted
                        }
                    }
                    SettingsRow {
                        Layout.fillWidth: true
                        label: qsTr("Match-to-match swing")
                        explanation: qsTr("A zone's true rate moves with the opponent, the score and the line-up; allowing for it, estimated from your own matches, keeps busy zones from being flagged by ordinary swings.")
                        CheckBox {
                            objectName: "matchVariation"
                            text: settings.matchVariation ? qsTr("Allowed for") : qsTr("Ignored (pure chance only)")
                            checked: settings.matchVariation
                            onToggled: settings.matchVariation = checked
                        }
                    }
                    SettingsRow {
                        Layout.fillWidth: true
                        label: qsTr("Off-target threshold")
                        explanation: qsTr("Used only when false flags a season is 0: off target when P(true value on the wrong side of the target) reaches this.")
                        defaultText: settings.offDefault
                        TextField {
                            Layout.preferredWidth: 90
                            text: settings.offThresholdText
                            onTextEdited: settings.offThresholdText = text
                        }
                    }
                    SettingsRow {
                        Layout.fillWidth: true
                        label: qsTr("Close-to-line threshold")
                        explanation: qsTr("Close to the line when P(short of the watch line: the target moved by its margin) reaches this.")
                        defaultText: settings.watchDefault
                        TextField {
                            Layout.preferredWidth: 90
                            text: settings.watchThresholdText
                            onTextEdited: settings.watchThresholdText = text
                        }
                    }
                    SettingsRow {
                        Layout.fillWidth: true
                        label: qsTr("False discovery rate")
                        explanation: qsTr("With it on, an off-target flag must also pass Benjamini–Hochberg at q among all judged zones.")
                        defaultText: settings.fdrDefault
                        CheckBox {
                            text: settings.fdr ? qsTr("On") : qsTr("Off")
                            checked: settings.fdr
                            onToggled: settings.fdr = checked
                        }
                        Label {
                            text: qsTr("q")
                            color: Theme.textMuted
                        }
                        TextField {
                            Layout.preferredWidth: 90
                            text: settings.fdrQText
                            onTextEdited: settings.fdrQText = text
                        }
                    }
                    Item { Layout.fillHeight: true }
                }
            }

            ScrollView {
                id: rightColumn
                Layout.preferredWidth: 450
                Layout.fillHeight: true
                contentWidth: availableWidth
                clip: true

                ColumnLayout {
                    width: rightColumn.availableWidth
                    spacing: Theme.gapLarge

                    Card {
                        title: qsTr("Intensity cap per microcycle day")
                        Layout.fillWidth: true

                        Label {
                            Layout.fillWidth: true
                            text: qsTr("The highest drill intensity the planner may choose each day: 1 recovery, 2 light, 3 moderate, 4 high, 5 maximal; 0 means no session. Common practice, no published source. Congested weeks take the lower cap of their two days.")
                            color: Theme.textMuted
                            font.pixelSize: Theme.fontSmall
                            wrapMode: Text.WordWrap
                        }
                        Repeater {
                            model: settings.caps
                            delegate: CapEditDelegate {
                                Layout.fillWidth: true
                                onEdited: (row, text) => settings.caps.setText(row, text)
                            }
                        }
                    }

                    GridChangeCard {
                        Layout.fillWidth: true
                        view: gridView
                    }

                    SquadListCard {
                        Layout.fillWidth: true
                        view: squadListView
                    }
                }
            }
        }
    }
}
