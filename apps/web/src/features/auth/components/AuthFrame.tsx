import { Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { Brand } from '../../../components/Brand';
import classes from './AuthFrame.module.css';

interface AuthFrameProps {
  title: string;
  subtitle?: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}

/** The frame of the pages seen before signing in: sign-in, registration, invitation. */
export function AuthFrame({ title, subtitle, children, footer }: AuthFrameProps) {
  return (
    <div className={classes.root}>
      <aside className={classes.side}>
        <div className={classes.sideBody}>
          <Brand tone="dark" size="lg" />
          <Title order={2} c="white" mt={48} maw={420} fz={30} lh={1.2}>
            The back office for firms that lay GRP flat roofs by hand.
          </Title>
          <Text mt="md" maw={420} c="topcoat.2">
            Stock on the shelf and in date, roofs measured into take-offs and estimates, orders approved
            before they go out, and every job&apos;s materials checked against what was quoted.
          </Text>
        </div>
        <div className={classes.layers} aria-hidden />
      </aside>
      <main className={classes.main}>
        <div className={classes.card}>
          <div className={classes.mobileBrand}>
            <Brand />
          </div>
          <Paper withBorder shadow="sm" p={{ base: 'lg', sm: 'xl' }}>
            <Stack gap={4} mb="lg">
              <Title order={1} fz={26}>
                {title}
              </Title>
              {subtitle ? (
                <Text c="dimmed" size="sm">
                  {subtitle}
                </Text>
              ) : null}
            </Stack>
            {children}
          </Paper>
          {footer ? (
            <Text ta="center" size="sm" mt="lg">
              {footer}
            </Text>
          ) : null}
        </div>
      </main>
    </div>
  );
}
