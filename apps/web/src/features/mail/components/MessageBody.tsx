import { Paper, Tabs, Text } from '@mantine/core';
import { useMemo } from 'react';
import { sanitiseMailHtml } from '../utils/sanitise-html';

interface MessageBodyProps {
  subject: string;
  text: string | null;
  html: string | null;
}

function PlainText({ text }: { text: string }) {
  return (
    <Paper withBorder p="md" radius="md" bg="topcoat.0">
      <Text
        component="pre"
        size="sm"
        ff="monospace"
        m={0}
        style={{ whiteSpace: 'pre-wrap', wordBreak: 'break-word' }}
      >
        {text}
      </Text>
    </Paper>
  );
}

/** The message itself: its HTML in a sandboxed frame, its plain text as written, or both in tabs. */
export function MessageBody({ subject, text, html }: MessageBodyProps) {
  const hasText = typeof text === 'string' && text.trim() !== '';
  const hasHtml = typeof html === 'string' && html.trim() !== '';
  const srcDoc = useMemo(() => (hasHtml && html ? sanitiseMailHtml(html) : ''), [hasHtml, html]);

  if (!hasText && !hasHtml) {
    return (
      <Text size="sm" c="dimmed">
        This message has no text.
      </Text>
    );
  }

  const frame = (
    <>
      <iframe
        title={`Message: ${subject}`}
        srcDoc={srcDoc}
        // No scripts, no same-origin access, no forms; links may open in a new tab.
        sandbox="allow-popups allow-popups-to-escape-sandbox"
        referrerPolicy="no-referrer"
        style={{
          width: '100%',
          height: '60vh',
          minHeight: 320,
          border: '1px solid var(--mantine-color-default-border)',
          borderRadius: 8,
          background: 'white',
        }}
      />
      <Text size="xs" c="dimmed" mt={4}>
        Shown in a locked frame: no scripts run and nothing is loaded from the internet, so remote pictures
        stay blank.
      </Text>
    </>
  );

  if (hasHtml && !hasText) {
    return frame;
  }
  if (hasText && !hasHtml) {
    return <PlainText text={text ?? ''} />;
  }
  return (
    <Tabs defaultValue="html" keepMounted={false}>
      <Tabs.List mb="sm">
        <Tabs.Tab value="html">As sent (HTML)</Tabs.Tab>
        <Tabs.Tab value="text">Plain text</Tabs.Tab>
      </Tabs.List>
      <Tabs.Panel value="html">{frame}</Tabs.Panel>
      <Tabs.Panel value="text">
        <PlainText text={text ?? ''} />
      </Tabs.Panel>
    </Tabs>
  );
}
