pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The mapping assistant on the Load matches page (a part of that page, driven by its
// LayoutAssistant): the table's columns with sample values and a role for each; how its times
// and positions are written, with the first events on a pitch; every team, event, result and
// period word with its meaning; the match details, the checks, and the name to save it under.
Rectangle {
    id: root

    required property LayoutAssistant assistant

    signal closeRequested()

    color: Theme.window

    readonly property var origins: [
        { id: "bottom-left", text: qsTr("bottom left") }, { id: "top-left", text: qsTr("top left") },
        { id: "bottom-right", text: qsTr("bottom right") }, { id: "top-right", text: qsTr("top right") },
        { id: "centre", text: qsTr("centre spot") }]
    readonly property var frames: [
        { id: "acting", text: qsTr("each team attacks left to right") },
        { id: "us", text: qsTr("we attack left to right, always") },
        { id: "ground", text: qsTr("fixed: ends change at half-time") }]
    readonly property var timeForms: [
        { id: "seconds", text: qsTr("seconds") }, { id: "clock", text: qsTr("clock (mm:ss)") },
        { id: "frames", text: qsTr("video frames") }]

    ColumnLayout {
        anchors.fill: parent
        spacing: Theme.gap

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            Label {
                Layout.fillWidth: true
                text: qsTr("Map a new table layout: %1").arg(root.assistant.fileName)
                font.pixelSize: Theme.fontTitle
                font.bold: true
                color: Theme.text
                elide: Text.ElideMiddle
            }
            Button {
                text: qsTr("Close without saving")
                onClicked: root.closeRequested()
            }
        }
        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            Label {
                Layout.fillWidth: true
                text: qsTr("Once per layout: say what each column holds; files with the same columns then load when dropped. Read as: %1").arg(root.assistant.tableText)
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                wrapMode: Text.WordWrap
            }
            Label { visible: root.assistant.delimited; text: qsTr("Columns split by"); color: Theme.textMuted }
            ComboBox {
                visible: root.assistant.delimited
                Layout.preferredWidth: 70
                model: [",", ";", "tab", "|"]
                currentIndex: Math.max(0, model.indexOf(root.assistant.delimiter))
                onActivated: root.assistant.delimiter = currentText
            }
            CheckBox {
                visible: root.assistant.delimited
                text: qsTr("Header row")
                checked: root.assistant.header
                onToggled: root.assistant.header = checked
            }
            CheckBox {
                text: qsTr("Decimal comma")
                checked: root.assistant.decimalComma
                onToggled: root.assistant.decimalComma = checked
            }
            ComboBox {
                Layout.preferredWidth: 130
                model: ["utf-8", "windows-1252", "latin-1"]
                currentIndex: Math.max(0, model.indexOf(root.assistant.encoding))
                onActivated: root.assistant.encoding = currentText
                ToolTip.visible: hovered
                ToolTip.text: qsTr("The text encoding: accented names look wrong when it is not right")
            }
        }

        GridLayout {
            Layout.fillWidth: true
            Layout.fillHeight: true
            columns: 3
            columnSpacing: Theme.gap
            rowSpacing: Theme.gap

            Card {
                Layout.fillWidth: true
                Layout.fillHeight: true
                Layout.rowSpan: 2
                Layout.preferredWidth: root.width * 0.31
                Layout.maximumWidth: root.width * 0.31
                title: qsTr("1 · What each column holds")
                ListView {
                    id: columnList
                    Layout.fillWidth: true
                    Layout.fillHeight: true
                    clip: true
                    model: root.assistant.columns
                    boundsBehavior: Flickable.StopAtBounds
                    ScrollBar.vertical: ScrollBar {}
                    delegate: LayoutColumnDelegate {
                        width: columnList.width - 10
                        roleChoices: root.assistant.roleChoices
                        onRoleChosen: (column, role) => root.assistant.setRole(column, role)
                    }
                }
            }

            Card {
                Layout.fillWidth: true
                Layout.preferredWidth: root.width * 0.36
                Layout.maximumWidth: root.width * 0.36
                title: qsTr("2 · Times and positions")
                GridLayout {
                    Layout.fillWidth: true
                    columns: 4
                    columnSpacing: Theme.gap
                    rowSpacing: 2
                    Label { text: qsTr("Time in"); color: Theme.textMuted }
                    ComboBox {
                        Layout.fillWidth: true
                        Layout.minimumWidth: 130
                        model: root.timeForms
                        textRole: "text"
                        valueRole: "id"
                        currentIndex: Math.max(0, indexOfValue(root.assistant.timeForm))
                        onActivated: root.assistant.timeForm = currentValue
                    }
                    CheckBox {
                        Layout.columnSpan: 2
                        text: qsTr("one clock from kick-off")
                        checked: root.assistant.timeFromKickoff
                        onToggled: root.assistant.timeFromKickoff = checked
                    }
                    Label { visible: root.assistant.byZone; text: qsTr("Zone grid"); color: Theme.textMuted }
                    TextField {
                        objectName: "zoneGrid"
                        visible: root.assistant.byZone
                        Layout.fillWidth: true
                        text: root.assistant.zoneGrid
                        onEditingFinished: root.assistant.zoneGrid = text
                        ToolTip.visible: hovered
                        ToolTip.text: qsTr("The grid the labels name: equal:BANDSxLANES (e.g. equal:6x5) or markings:BANDS")
                    }
                    Label { visible: root.assistant.byZone; text: qsTr("Labels like"); color: Theme.textMuted }
                    TextField {
                        objectName: "zonePattern"
                        visible: root.assistant.byZone
                        Layout.fillWidth: true
                        text: root.assistant.zonePattern
                        placeholderText: "B{band}-L{lane}"
                        onEditingFinished: root.assistant.zonePattern = text
                        ToolTip.visible: hovered
                        ToolTip.text: qsTr("How a label names its zone; labels it does not read are listed under Words, to map one by one")
                    }
                    Label { visible: !root.assistant.byZone; text: qsTr("Extent"); color: Theme.textMuted }
                    RowLayout {
                        visible: !root.assistant.byZone
                        Layout.columnSpan: 3
                        TextField {
                            objectName: "extentWidth"
                            Layout.preferredWidth: 70
                            text: root.assistant.extentWidth
                            validator: DoubleValidator { bottom: 0.001 }
                            onEditingFinished: root.assistant.extentWidth = Number(text)
                        }
                        Label { text: qsTr("along ×"); color: Theme.textMuted }
                        TextField {
                            Layout.preferredWidth: 70
                            text: root.assistant.extentHeight
                            validator: DoubleValidator { bottom: 0.001 }
                            onEditingFinished: root.assistant.extentHeight = Number(text)
                        }
                        Label {
                            Layout.fillWidth: true
                            text: qsTr("across: metres, 100 × 100, a video's pixels…")
                            color: Theme.textMuted
                            font.pixelSize: Theme.fontSmall
                            elide: Text.ElideRight
                        }
                    }
                    Label { visible: !root.assistant.byZone; text: qsTr("0, 0 at"); color: Theme.textMuted }
                    ComboBox {
                        objectName: "origin"
                        visible: !root.assistant.byZone
                        Layout.fillWidth: true
                        model: root.origins
                        textRole: "text"
                        valueRole: "id"
                        currentIndex: Math.max(0, indexOfValue(root.assistant.origin))
                        onActivated: root.assistant.origin = currentValue
                    }
                    CheckBox {
                        visible: !root.assistant.byZone
                        Layout.columnSpan: 2
                        enabled: root.assistant.origin === "centre"
                        text: qsTr("y runs down")
                        checked: root.assistant.yDown
                        onToggled: root.assistant.yDown = checked
                    }
                    Label { text: qsTr("Direction"); color: Theme.textMuted }
                    ComboBox {
                        Layout.columnSpan: 3
                        Layout.fillWidth: true
                        model: root.frames
                        textRole: "text"
                        valueRole: "id"
                        currentIndex: Math.max(0, indexOfValue(root.assistant.frame))
                        onActivated: root.assistant.frame = currentValue
                    }
                    CheckBox {
                        visible: root.assistant.frame === "ground"
                        Layout.columnSpan: 4
                        text: qsTr("in the first half we attack towards 0 (ends change each period)")
                        checked: root.assistant.firstHalfTowardsZero
                        onToggled: root.assistant.firstHalfTowardsZero = checked
                    }
                }
                LayoutPreview {
                    Layout.fillWidth: true
                    Layout.preferredHeight: 190
                    points: root.assistant.previewPoints
                }
                Label {
                    Layout.fillWidth: true
                    text: root.assistant.previewText.length > 0 ? root.assistant.previewText
                                                               : qsTr("The first events appear here once time, team, event and both positions have a column.")
                    wrapMode: Text.WordWrap
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                }
            }

            Card {
                Layout.fillWidth: true
                Layout.fillHeight: true
                Layout.rowSpan: 2
                Layout.preferredWidth: root.width * 0.31
                Layout.maximumWidth: root.width * 0.31
                title: root.assistant.unmappedCount > 0 ? qsTr("3 · Words (%1 not mapped yet)").arg(root.assistant.unmappedCount)
                                                        : qsTr("3 · Words")
                ListView {
                    id: wordList
                    Layout.fillWidth: true
                    Layout.fillHeight: true
                    clip: true
                    model: root.assistant.words
                    boundsBehavior: Flickable.StopAtBounds
                    ScrollBar.vertical: ScrollBar {}
                    delegate: LayoutWordDelegate {
                        width: wordList.width - 10
                        choices: root.assistant.wordChoices(modelData.field)
                        onWordChosen: (field, word, ours) => root.assistant.setWord(field, word, ours)
                    }
                }
            }

            LayoutSaveCard {
                Layout.fillWidth: true
                Layout.fillHeight: true
                Layout.preferredWidth: root.width * 0.36
                Layout.maximumWidth: root.width * 0.36
                assistant: root.assistant
            }
        }
    }
}
